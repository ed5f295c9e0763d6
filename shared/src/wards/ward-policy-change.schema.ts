import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import { reasonText } from '../orders/order.schema.js';
import { signedRequestSchema } from '../orders/orders-requests.schema.js';
import { updateWardPolicySchema } from './wards-requests.schema.js';

/**
 * A change to a ward's clinical settings (intervals, thresholds) is proposed by an admin, signed, and applies
 * only when a charge nurse or a pharmacist signs it off (`wardPolicyApprovalRefusal`). The ward's e-mail
 * addresses are not clinical: the admin changes them alone (PATCH /wards/:wardId/policy).
 */
export const WARD_POLICY_CHANGE_STATUSES = ['pending', 'applied', 'declined'] as const;
export type WardPolicyChangeStatus = (typeof WARD_POLICY_CHANGE_STATUSES)[number];

/** The clinical settings a proposal may change: every ward policy setting except the e-mail addresses. */
export const wardPolicySettingChangesSchema = updateWardPolicySchema
  .omit({ pharmacyEmail: true, nurseInChargeEmail: true })
  .refine((changes) => Object.keys(changes).length > 0, 'Change at least one setting');
export type WardPolicySettingChanges = z.infer<typeof wardPolicySettingChangesSchema>;
export type WardPolicySettingField = keyof WardPolicySettingChanges;

const TOO_LONG = 'At most 1,000 characters';

/** The admin proposes, gives the reason and signs with their password. */
export const proposeWardPolicyChangeSchema = signedRequestSchema.extend({
  changes: wardPolicySettingChangesSchema,
  reason: reasonText('Give the reason for the change', 'Give the reason for the change', TOO_LONG),
});
export type ProposeWardPolicyChangeRequest = z.infer<typeof proposeWardPolicyChangeSchema>;

/** A charge nurse or pharmacist, not the proposer, signs it off with their password; it applies at once. */
export const signOffWardPolicyChangeSchema = signedRequestSchema;
export type SignOffWardPolicyChangeRequest = z.infer<typeof signOffWardPolicyChangeSchema>;

/** A charge nurse or pharmacist declines it, with a reason, signed; nothing changes. */
export const declineWardPolicyChangeSchema = signedRequestSchema.extend({
  reason: reasonText('Give the reason for declining', 'Give the reason for declining', TOO_LONG),
});
export type DeclineWardPolicyChangeRequest = z.infer<typeof declineWardPolicyChangeSchema>;

const person = z.object({ id: z.number().int(), name: z.string() });

/** One proposed change: each setting from its value when proposed to the value proposed. */
export const wardPolicyChangeSchema = answer(
  'WardPolicyChange',
  z.object({
    id: z.number().int(),
    wardId: z.number().int(),
    wardName: z.string(),
    status: z.enum(WARD_POLICY_CHANGE_STATUSES),
    settings: z.array(z.object({ field: z.string(), from: z.number(), to: z.number() })),
    reason: z.string(),
    proposedBy: person,
    proposedAt: z.string(),
    decidedBy: person.nullable(),
    decidedAt: z.string().nullable(),
    declineReason: z.string().nullable(),
  }),
);
export type WardPolicyChange = z.infer<typeof wardPolicyChangeSchema>;

export const wardPolicyChangesSchema = answer('WardPolicyChanges', z.array(wardPolicyChangeSchema));
