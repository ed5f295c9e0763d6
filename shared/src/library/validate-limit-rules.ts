import { REGIMEN_FIELD_LABELS } from '../dose/regimen-fields.js';
import type { Limits, RegimenField } from '../dose/types.js';
import { LIMIT_KEYS, type LimitRuleInput, type RuleProblem } from './library.schema.js';
import { ruleKey } from './rule-key.js';

const LIMIT_LABELS = { hardMin: 'hard minimum', softMin: 'soft minimum', softMax: 'soft maximum', hardMax: 'hard maximum' };

/**
 * Problems that a well-typed set of rules can still have: limits out of order (hard minimum ≤
 * soft minimum ≤ soft maximum ≤ hard maximum, where present) and two rules for one drug at one
 * concentration. Paths are `rules.<index>.…`, so a form or CSV importer can point at the cell.
 */
export function validateLimitRules(rules: readonly LimitRuleInput[]): RuleProblem[] {
  const problems: RuleProblem[] = [];
  const firstIndexByKey = new Map<string, number>();
  rules.forEach((rule, index) => {
    const key = ruleKey(rule);
    const first = firstIndexByKey.get(key);
    if (first !== undefined) {
      problems.push({
        path: `rules.${index}.concentrationPerMl`,
        message: `Rule ${index + 1} repeats rule ${first + 1}: one rule per drug and concentration`,
      });
    } else firstIndexByKey.set(key, index);

    for (const [field, limits] of Object.entries(rule.limits) as [RegimenField, Limits | undefined][]) {
      if (limits) problems.push(...limitOrderProblems(limits, `rules.${index}.limits.${field}`, REGIMEN_FIELD_LABELS[field]));
    }
  });
  return problems;
}

/** Each present limit must not be below any present limit before it in hardMin, softMin, softMax, hardMax. */
export function limitOrderProblems(limits: Limits, path: string, fieldLabel: string): RuleProblem[] {
  const problems: RuleProblem[] = [];
  LIMIT_KEYS.forEach((key, position) => {
    const value = limits[key];
    if (value === null || value === undefined) return;
    for (const earlier of LIMIT_KEYS.slice(0, position)) {
      const bound = limits[earlier];
      if (bound !== null && bound !== undefined && value < bound) {
        problems.push({
          path: `${path}.${key}`,
          message: `${fieldLabel}: the ${LIMIT_LABELS[key]} (${value}) is below the ${LIMIT_LABELS[earlier]} (${bound})`,
        });
        return;
      }
    }
  });
  return problems;
}
