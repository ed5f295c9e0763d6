import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import { must } from '../api/request-rules.js';
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

const wardContactFields = updateWardPolicySchema.pick({ pharmacyEmail: true, nurseInChargeEmail: true }).shape;
const wardPolicySettingFields = updateWardPolicySchema.omit({ pharmacyEmail: true, nurseInChargeEmail: true }).shape;

/**
 * The clinical settings a proposal may change: every ward policy setting except the e-mail addresses. At
 * least one setting is named before the settings themselves are checked (as the server's DTO does).
 */
export const wardPolicySettingChangesSchema = z
  .looseObject({}, must('Choose the settings to change', 'changes must be an object of settings'))
  .refine((changes) => Object.keys(changes).some((key) => Object.hasOwn(wardPolicySettingFields, key)), {
    message: 'Change at least one setting',
    abort: true,
  })
  .pipe(z.strictObject(wardPolicySettingFields));
export type WardPolicySettingChanges = z.infer<typeof wardPolicySettingChangesSchema>;
export type WardPolicySettingField = keyof WardPolicySettingChanges;

/** Every clinical setting's name, in the order the ward policy lists them. */
export const WARD_POLICY_SETTING_FIELDS = Object.keys(wardPolicySettingFields) as WardPolicySettingField[];

export const CLINICAL_SETTING_NEEDS_SIGN_OFF =
  'Clinical settings change through a proposed change that a charge nurse or a pharmacist signs off';

/**
 * What the admin changes alone (PATCH /wards/:wardId/policy): the e-mail addresses. A clinical setting sent
 * there is refused naming the field, with the way to change it.
 */
export const updateWardContactsSchema = z.strictObject({
  ...wardContactFields,
  ...(Object.fromEntries(WARD_POLICY_SETTING_FIELDS.map((field) => [field, z.never(CLINICAL_SETTING_NEEDS_SIGN_OFF).optional()])) as Record<
    WardPolicySettingField,
    z.ZodOptional<z.ZodNever>
  >),
});
export type UpdateWardContactsRequest = Pick<z.infer<typeof updateWardContactsSchema>, keyof typeof wardContactFields>;

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
