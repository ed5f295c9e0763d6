import { z } from 'zod';
import { isWhole, must } from '../api/request-rules.js';
import { pumpSettingsSchema } from '../bedside/bedside-requests.schema.js';
import { signatureSchema } from '../orders/order.schema.js';
import { SIGNOFF_ROLES } from './handover.schema.js';

/**
 * A nurse confirms one PCA at handover, as the outgoing or the incoming nurse, signing with their
 * password. The incoming nurse re-enters the pump's settings blind (`settings`, required for
 * them); the server compares them with the running order as the bedside check does.
 */
export const createSignoffSchema = z.strictObject({
  orderId: z
    .number(must('Choose the PCA to confirm', 'orderId must be a whole number'))
    .refine(isWhole, 'orderId must be a whole number')
    .positive('orderId must be positive'),
  role: z.enum(SIGNOFF_ROLES, must('Say whether you are the outgoing or incoming nurse', 'role is outgoing or incoming')),
  /** The incoming nurse's reading of the pump; the outgoing nurse leaves it out. */
  settings: z.strictObject(pumpSettingsSchema.shape, 'settings must be the pump settings').nullish(),
  signature: signatureSchema,
});
export type CreateSignoffRequest = z.infer<typeof createSignoffSchema>;
