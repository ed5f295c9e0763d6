import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import { REGIMEN_FIELDS } from '../dose/regimen-fields.js';
import { findingSchema } from '../orders/order-response.schema.js';
import { ORDER_STATUSES } from '../orders/order-status.js';
import type { RegimenField } from '../dose/types.js';
import { DIFF_LIMIT_KEYS, type LibraryDiff, type NamedRule, type RuleChange } from './diff-library.js';
import { libraryVersionDetailSchema, libraryVersionSchema, limitRuleSchema } from './library.schema.js';

answer('LimitRule', limitRuleSchema);
answer('LibraryVersion', libraryVersionSchema);
answer('LibraryVersionDetail', libraryVersionDetailSchema);

// An answered rule without its id: built from the answer's own (loose) shape, not the request's.
// A rule read from a CSV file has no population fields when it is an adult rule (absent means adult).
export const namedRuleSchema: z.ZodType<NamedRule> = answer(
  'NamedRule',
  limitRuleSchema
    .omit({ id: true })
    .partial({ population: true, minAgeYears: true, maxAgeYears: true, minWeightKg: true, maxWeightKg: true }),
);

const limitValue = z.number().nullable();
const ruleChangeSchema: z.ZodType<RuleChange> = z.union([
  z.object({
    field: z.enum(REGIMEN_FIELDS as [RegimenField, ...RegimenField[]]),
    limit: z.enum(DIFF_LIMIT_KEYS),
    from: limitValue,
    to: limitValue,
  }),
  z.object({ field: z.literal('perKg'), from: z.boolean(), to: z.boolean() }),
  z.object({ field: z.literal('doseUnit'), from: z.string(), to: z.string() }),
]);

const diffShape = {
  added: z.array(namedRuleSchema),
  removed: z.array(namedRuleSchema),
  changed: z.array(
    z.object({ drugName: z.string(), concentrationPerMl: z.number(), doseUnit: z.string(), changes: z.array(ruleChangeSchema) }),
  ),
};

export const libraryDiffSchema: z.ZodType<LibraryDiff> = answer('LibraryDiff', z.object(diffShape));

/** A version's changes against the ward's active version (null when there is none to compare with). */
export const versionDiffSchema = answer('LibraryVersionDiff', z.object({ ...diffShape, againstVersionId: z.number().int().nullable() }));
export type VersionDiff = z.infer<typeof versionDiffSchema>;

/** The answer to an import with `dryRun`: the file's rules and their diff against the active version. */
export const importPreviewSchema = answer('LibraryImportPreview', z.object({ rules: z.array(namedRuleSchema), diff: libraryDiffSchema }));
export type ImportPreview = z.infer<typeof importPreviewSchema>;

/** An open order (verified or running) that a version's rules would put outside a limit, with the findings. */
export const libraryAffectedOrderSchema = answer(
  'LibraryAffectedOrder',
  z.object({
    orderId: z.number().int(),
    status: z.enum(ORDER_STATUSES),
    patientId: z.number().int(),
    patientName: z.string(),
    bed: z.string(),
    drugName: z.string(),
    concentrationPerMl: z.number(),
    doseUnit: z.string(),
    /** The hard and soft findings of the shared order check against this version's rule. */
    findings: z.array(findingSchema),
  }),
);
export type LibraryAffectedOrder = z.infer<typeof libraryAffectedOrderSchema>;

export const libraryAffectedOrdersSchema = answer(
  'LibraryAffectedOrders',
  z.object({
    versionId: z.number().int(),
    wardId: z.number().int(),
    /** How many open orders on the ward were checked. */
    checked: z.number().int(),
    orders: z.array(libraryAffectedOrderSchema),
  }),
);
export type LibraryAffectedOrders = z.infer<typeof libraryAffectedOrdersSchema>;
