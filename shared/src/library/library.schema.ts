import { z } from 'zod';
import { isWhole, must } from '../api/request-rules.js';
import { DOSE_UNITS, doseUnitSchema } from '../drugs/drug.schema.js';
import { REGIMEN_FIELDS } from '../dose/regimen-fields.js';
import type { RegimenField } from '../dose/types.js';
import { type BandField, POPULATIONS } from './rule-population.js';

export const LIBRARY_STATUSES = ['draft', 'pending_approval', 'active', 'retired'] as const;
export const libraryStatusSchema = z.enum(LIBRARY_STATUSES);
export type LibraryStatus = z.infer<typeof libraryStatusSchema>;

export const LIBRARY_STATUS_LABELS: Record<LibraryStatus, string> = {
  draft: 'Draft',
  pending_approval: 'Awaiting approval',
  active: 'Active',
  retired: 'Retired',
};

export const LIMIT_KEYS = ['hardMin', 'softMin', 'softMax', 'hardMax'] as const;
export type LimitKey = (typeof LIMIT_KEYS)[number];

const limitValue = (key: LimitKey) =>
  z
    .number(must(`${key} must be a number`))
    .min(0, `${key} must be 0 or more`)
    .nullish();
/** One regimen field's limits; a limit left out or null is not checked. */
export const limitsSchema = z.strictObject({
  hardMin: limitValue('hardMin'),
  softMin: limitValue('softMin'),
  softMax: limitValue('softMax'),
  hardMax: limitValue('hardMax'),
  /** Per-kg rules: the most the field may ever be, in the dose unit (rule-population.ts checks it). */
  ceiling: z.number(must('ceiling must be a number')).min(0, 'ceiling must be 0 or more').nullish(),
});

export const regimenFieldSchema = z.enum(REGIMEN_FIELDS as [RegimenField, ...RegimenField[]]);

export type LimitsInput = z.infer<typeof limitsSchema>;

/** A field's limits may be left out (not checked), never null. */
const fieldLimits = (field: RegimenField) => z.strictObject(limitsSchema.shape, must(`${field} must be an object`)).optional();

/** Limits per regimen field; a field left out is not checked. */
export const ruleLimitsSchema = z.strictObject(
  {
    loadingDose: fieldLimits('loadingDose'),
    demandDose: fieldLimits('demandDose'),
    lockoutMinutes: fieldLimits('lockoutMinutes'),
    basalRatePerHour: fieldLimits('basalRatePerHour'),
    oneHourLimit: fieldLimits('oneHourLimit'),
    fourHourLimit: fieldLimits('fourHourLimit'),
    clinicianBolusDose: fieldLimits('clinicianBolusDose'),
  } satisfies Record<RegimenField, z.ZodType>,
  must('limits is required', 'limits must be an object of parameter limits'),
);
export type RuleLimitsInput = z.infer<typeof ruleLimitsSchema>;

const bandValue = (key: BandField) =>
  z
    .number(must(`${key} must be a number`))
    .min(0, `${key} must be 0 or more`)
    .nullish();

/** A limit rule as written by a pharmacist (editor or CSV), before it has an id. */
export const limitRuleInputSchema = z.strictObject({
  drugId: z
    .number(must('drugId is required', 'drugId must be a whole number'))
    .refine(isWhole, 'drugId must be a whole number')
    .positive('drugId must be positive'),
  concentrationPerMl: z
    .number(must('concentrationPerMl is required', 'concentrationPerMl must be a number'))
    .positive('Concentration must be more than 0'),
  doseUnit: z.enum(DOSE_UNITS, must('doseUnit is required', 'doseUnit must be mg or mcg')),
  perKg: z.boolean(must('perKg is required', 'perKg must be true or false')),
  // Who the rule is for (rule-population.ts); left out, an adult rule with no band.
  population: z.enum(POPULATIONS, must('population must be adult or paediatric')).optional(),
  minAgeYears: bandValue('minAgeYears'),
  maxAgeYears: bandValue('maxAgeYears'),
  minWeightKg: bandValue('minWeightKg'),
  maxWeightKg: bandValue('maxWeightKg'),
  limits: ruleLimitsSchema,
});
export type LimitRuleInput = z.infer<typeof limitRuleInputSchema>;

// An answer's rule keeps its own, looser shape: a request's strictness and words are not an answer's.
const answeredLimit = z.number().finite().nonnegative().nullable().optional();
const answeredLimits = z.object({
  hardMin: answeredLimit,
  softMin: answeredLimit,
  softMax: answeredLimit,
  hardMax: answeredLimit,
  ceiling: answeredLimit,
});
export const limitRuleSchema = z.object({
  drugId: z.number().int().positive(),
  concentrationPerMl: z.number().finite().positive(),
  doseUnit: doseUnitSchema,
  perKg: z.boolean(),
  population: z.enum(POPULATIONS),
  minAgeYears: z.number().finite().nullable(),
  maxAgeYears: z.number().finite().nullable(),
  minWeightKg: z.number().finite().nullable(),
  maxWeightKg: z.number().finite().nullable(),
  limits: z.partialRecord(regimenFieldSchema, answeredLimits),
  id: z.number().int(),
  drugName: z.string(),
});
export type LimitRuleResponse = z.infer<typeof limitRuleSchema>;

export const libraryVersionSchema = z.object({
  id: z.number().int(),
  wardId: z.number().int(),
  wardName: z.string(),
  number: z.number().int(),
  status: libraryStatusSchema,
  note: z.string(),
  authorId: z.number().int(),
  authorName: z.string(),
  approverId: z.number().int().nullable(),
  approverName: z.string().nullable(),
  createdAt: z.string(),
  submittedAt: z.string().nullable(),
  approvedAt: z.string().nullable(),
  retiredAt: z.string().nullable(),
  ruleCount: z.number().int(),
});
export type LibraryVersion = z.infer<typeof libraryVersionSchema>;

/** What a pharmacist did to a version's content; none of them may approve it. */
export const LIBRARY_CONTRIBUTIONS = ['created', 'imported', 'edited', 'submitted'] as const;
export type LibraryContribution = (typeof LIBRARY_CONTRIBUTIONS)[number];
export const LIBRARY_CONTRIBUTION_LABELS: Record<LibraryContribution, string> = {
  created: 'Created',
  imported: 'Imported',
  edited: 'Edited the rules',
  submitted: 'Submitted',
};
export const libraryContributorSchema = z.object({
  userId: z.number().int(),
  userName: z.string(),
  action: z.enum(LIBRARY_CONTRIBUTIONS),
  at: z.string(),
});
export type LibraryContributor = z.infer<typeof libraryContributorSchema>;

/** The last time a reviewing pharmacist sent the version back to draft, with their comment. */
export const librarySendBackSchema = z.object({
  byId: z.number().int(),
  byName: z.string(),
  at: z.string(),
  comment: z.string(),
});
export type LibrarySendBack = z.infer<typeof librarySendBackSchema>;

export const libraryVersionDetailSchema = libraryVersionSchema.extend({
  rules: z.array(limitRuleSchema),
  /** Everyone who created, imported, edited or submitted it, oldest first. */
  contributors: z.array(libraryContributorSchema),
  sentBack: librarySendBackSchema.nullable(),
});
export type LibraryVersionDetail = z.infer<typeof libraryVersionDetailSchema>;

/** Where a rule problem is: a dotted path (`rules.2.limits.demandDose.softMax`) or a CSV cell. */
export const ruleProblemSchema = z.object({ path: z.string(), message: z.string() });
export type RuleProblem = z.infer<typeof ruleProblemSchema>;
