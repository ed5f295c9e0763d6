import { z } from 'zod';
import { momentSchema } from '../api/date-time.js';
import { atMost, isPlainObject, isWhole, listOf, must } from '../api/request-rules.js';
import { reasonText } from '../orders/order.schema.js';
import { signedRequestSchema } from '../orders/orders-requests.schema.js';
import { limitRuleInputSchema } from './library.schema.js';
import { LIBRARY_MAX_RULES } from './limit-bounds.js';

const note = z.string('note must be text').refine(atMost(1000), 'The note is at most 1,000 characters').nullish();
const wardId = z
  .number(must('wardId is required', 'wardId must be a whole number'))
  .refine(isWhole, 'wardId must be a whole number')
  .positive('wardId must be positive');

/** A draft copies the ward's active version (or starts empty). */
export const createDraftSchema = z.strictObject({ wardId, note });
export type CreateDraftRequest = z.infer<typeof createDraftSchema>;

/** Every rule of the draft, replacing the ones it had. */
export const replaceRulesSchema = z.strictObject({
  rules: listOf(
    limitRuleInputSchema,
    { required: 'rules is required', type: 'rules must be a list', max: [LIBRARY_MAX_RULES, 'A library version holds at most 500 rules'] },
    [[isPlainObject, 'Each rule must be an object']],
  ),
});
export type ReplaceRulesRequest = z.infer<typeof replaceRulesSchema>;

export const submitVersionSchema = z.strictObject({ note });
export type SubmitVersionRequest = z.infer<typeof submitVersionSchema>;

/** The approver signs the submission they reviewed, named by its `submittedAt`. */
export const approveVersionSchema = signedRequestSchema.extend({
  submittedAt: momentSchema(
    'submittedAt is required: the submission you reviewed',
    'submittedAt must be the time the reviewed version was submitted',
  ),
});
export type ApproveVersionRequest = z.infer<typeof approveVersionSchema>;

/** A reviewing pharmacist sends a submitted version back to draft, signed, saying what to change. */
export const sendBackVersionSchema = signedRequestSchema.extend({
  comment: reasonText('Say what needs changing', 'comment must be text', 'The comment is at most 1,000 characters'),
});
export type SendBackVersionRequest = z.infer<typeof sendBackVersionSchema>;

/** A multipart field repeated is a list of texts; a single one is read as a number, as the server's @Type(() => Number) does. */
const asNumber = (value: unknown) => (value === null || value === undefined || Array.isArray(value) ? value : Number(value));
/** Multipart text: `true` and `false` are read as the booleans. */
const asBoolean = (value: unknown) => (value === 'true' ? true : value === 'false' ? false : value);

/** The text fields of the CSV import's multipart body (the file itself is checked by the server). */
export const importLibraryFieldsSchema = z.strictObject({
  wardId: z.preprocess(asNumber, wardId),
  note,
  /** Check and preview the file; write nothing. */
  dryRun: z.preprocess(asBoolean, z.boolean('dryRun must be true or false')).nullish(),
});
export type ImportLibraryFields = z.infer<typeof importLibraryFieldsSchema>;
