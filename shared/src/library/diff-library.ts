import { REGIMEN_FIELDS } from '../dose/regimen-fields.js';
import type { RegimenField } from '../dose/types.js';
import { LIMIT_KEYS, type LimitRuleInput } from './library.schema.js';
import { ruleKey } from './rule-key.js';

export type NamedRule = LimitRuleInput & { drugName: string };

/** The limits a diff compares: the four limits and a per-kg rule's absolute ceiling. */
export const DIFF_LIMIT_KEYS = [...LIMIT_KEYS, 'ceiling'] as const;
export type DiffLimitKey = (typeof DIFF_LIMIT_KEYS)[number];

export type RuleChange =
  | { field: RegimenField; limit: DiffLimitKey; from: number | null; to: number | null }
  | { field: 'perKg'; from: boolean; to: boolean }
  | { field: 'doseUnit'; from: string; to: string };

export type ChangedRule = {
  drugName: string;
  concentrationPerMl: number;
  doseUnit: string;
  changes: RuleChange[];
};

export type LibraryDiff = { added: NamedRule[]; removed: NamedRule[]; changed: ChangedRule[] };

/** What `next` changes against `base`: rules added, removed, and every limit that differs. */
export function diffLibrary(base: readonly NamedRule[], next: readonly NamedRule[]): LibraryDiff {
  const baseByKey = new Map(base.map((rule) => [ruleKey(rule), rule]));
  const nextKeys = new Set(next.map(ruleKey));
  const added: NamedRule[] = [];
  const changed: ChangedRule[] = [];
  for (const rule of next) {
    const before = baseByKey.get(ruleKey(rule));
    if (!before) {
      added.push(rule);
      continue;
    }
    const changes = ruleChanges(before, rule);
    if (changes.length > 0) {
      changed.push({ drugName: rule.drugName, concentrationPerMl: rule.concentrationPerMl, doseUnit: rule.doseUnit, changes });
    }
  }
  const removed = base.filter((rule) => !nextKeys.has(ruleKey(rule)));
  return { added, removed, changed };
}

function ruleChanges(before: NamedRule, after: NamedRule): RuleChange[] {
  const changes: RuleChange[] = [];
  if (before.doseUnit !== after.doseUnit) changes.push({ field: 'doseUnit', from: before.doseUnit, to: after.doseUnit });
  if (before.perKg !== after.perKg) changes.push({ field: 'perKg', from: before.perKg, to: after.perKg });
  for (const field of REGIMEN_FIELDS) {
    for (const limit of DIFF_LIMIT_KEYS) {
      const from = before.limits[field]?.[limit] ?? null;
      const to = after.limits[field]?.[limit] ?? null;
      if (from !== to) changes.push({ field, limit, from, to });
    }
  }
  return changes;
}

export function isEmptyDiff(diff: LibraryDiff): boolean {
  return diff.added.length === 0 && diff.removed.length === 0 && diff.changed.length === 0;
}
