import { z } from 'zod';
import { isWhole, must } from '../api/request-rules.js';
import { SIGNOFF_ROLES } from './handover.schema.js';

/** A nurse confirms one PCA at handover, as the outgoing or the incoming nurse. */
export const createSignoffSchema = z.strictObject({
  orderId: z
    .number(must('Choose the PCA to confirm', 'orderId must be a whole number'))
    .refine(isWhole, 'orderId must be a whole number')
    .positive('orderId must be positive'),
  role: z.enum(SIGNOFF_ROLES, must('Say whether you are the outgoing or incoming nurse', 'role is outgoing or incoming')),
  /** The incoming nurse confirms the pump settings match the order (a re-check at handover). */
  pumpSettingsMatch: z.boolean('pumpSettingsMatch must be true or false').nullish(),
});
export type CreateSignoffRequest = z.infer<typeof createSignoffSchema>;
