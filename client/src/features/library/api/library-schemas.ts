import { z } from 'zod';
import { LIMIT_KEYS, limitRuleInputSchema, REGIMEN_FIELDS, type LibraryDiff, type NamedRule, type RuleChange } from '@lockstep/shared';

// The shared package types the diff and the import preview but has no schema for them (yet), so
// the client checks those answers here, typed against the shared types to catch drift. The rule
// change is checked by a guard rather than z.union/z.literal: zod is in the first download, and
// those would add to it for this one screen.

export const namedRuleSchema: z.ZodType<NamedRule> = limitRuleInputSchema.extend({ drugName: z.string() });

const isLimitValue = (value: unknown) => value === null || (typeof value === 'number' && Number.isFinite(value));

export function isRuleChange(value: unknown): value is RuleChange {
  if (typeof value !== 'object' || value === null) return false;
  const { field, limit, from, to } = value as Record<string, unknown>;
  if (field === 'perKg') return typeof from === 'boolean' && typeof to === 'boolean';
  if (field === 'doseUnit') return typeof from === 'string' && typeof to === 'string';
  return (
    (REGIMEN_FIELDS as readonly unknown[]).includes(field) &&
    (LIMIT_KEYS as readonly unknown[]).includes(limit) &&
    isLimitValue(from) &&
    isLimitValue(to)
  );
}

const diffShape = {
  added: z.array(namedRuleSchema),
  removed: z.array(namedRuleSchema),
  changed: z.array(
    z.object({
      drugName: z.string(),
      concentrationPerMl: z.number(),
      doseUnit: z.string(),
      changes: z.array(z.custom<RuleChange>(isRuleChange, { error: 'Not a rule change' })),
    }),
  ),
};

export const libraryDiffSchema: z.ZodType<LibraryDiff> = z.object(diffShape);

export type VersionDiff = LibraryDiff & { againstVersionId: number | null };

export const versionDiffSchema: z.ZodType<VersionDiff> = z.object({ ...diffShape, againstVersionId: z.number().int().nullable() });

/** The answer to an import with `dryRun=true`: the file's rules and their diff against active. */
export type ImportPreview = { rules: NamedRule[]; diff: LibraryDiff };

export const importPreviewSchema: z.ZodType<ImportPreview> = z.object({ rules: z.array(namedRuleSchema), diff: libraryDiffSchema });
