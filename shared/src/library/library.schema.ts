import { z } from 'zod';
import { doseUnitSchema } from '../drugs/drug.schema.js';
import { REGIMEN_FIELDS } from '../dose/regimen-fields.js';
import type { RegimenField } from '../dose/types.js';

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

const limitValue = z.number().finite().nonnegative().nullable().optional();
export const limitsSchema = z.object({
  hardMin: limitValue,
  softMin: limitValue,
  softMax: limitValue,
  hardMax: limitValue,
});

export const regimenFieldSchema = z.enum(REGIMEN_FIELDS as [RegimenField, ...RegimenField[]]);

/** A limit rule as written by a pharmacist (editor or CSV), before it has an id. */
export const limitRuleInputSchema = z.object({
  drugId: z.number().int().positive(),
  concentrationPerMl: z.number().finite().positive('Concentration must be more than 0'),
  doseUnit: doseUnitSchema,
  perKg: z.boolean(),
  limits: z.partialRecord(regimenFieldSchema, limitsSchema),
});
export type LimitRuleInput = z.infer<typeof limitRuleInputSchema>;

export const limitRuleSchema = limitRuleInputSchema.extend({
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

export const libraryVersionDetailSchema = libraryVersionSchema.extend({
  rules: z.array(limitRuleSchema),
});
export type LibraryVersionDetail = z.infer<typeof libraryVersionDetailSchema>;

/** Where a rule problem is: a dotted path (`rules.2.limits.demandDose.softMax`) or a CSV cell. */
export const ruleProblemSchema = z.object({ path: z.string(), message: z.string() });
export type RuleProblem = z.infer<typeof ruleProblemSchema>;
