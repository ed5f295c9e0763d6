import { REGIMEN_FIELD_LABELS } from '../dose/regimen-fields.js';
import type { Limits, RegimenField } from '../dose/types.js';
import { LIMIT_KEYS, type LimitRuleInput, type RuleProblem } from './library.schema.js';
import { concentrationProblem, limitValueProblem } from './limit-bounds.js';
import { ruleKey } from './rule-key.js';
import { populationProblems } from './rule-population.js';

const LIMIT_LABELS = { hardMin: 'hard minimum', softMin: 'soft minimum', softMax: 'soft maximum', hardMax: 'hard maximum' };

/**
 * Problems that a well-typed set of rules can still have: a limit or concentration that is not a
 * finite number within its bound (limit-bounds.ts), limits out of order (hard minimum ≤ soft
 * minimum ≤ soft maximum ≤ hard maximum, where present) and two rules for one drug at one
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
        message: `Rule ${index + 1} repeats rule ${first + 1}: one rule per drug, concentration and population`,
      });
    } else firstIndexByKey.set(key, index);
    const badConcentration = concentrationProblem(rule.concentrationPerMl);
    if (badConcentration) problems.push({ path: `rules.${index}.concentrationPerMl`, message: badConcentration });
    for (const [field, limits] of Object.entries(rule.limits) as [RegimenField, Limits | undefined][]) {
      if (!limits) continue;
      const path = `rules.${index}.limits.${field}`;
      const outOfRange = limitRangeProblems(field, limits, path);
      problems.push(...(outOfRange.length > 0 ? outOfRange : limitOrderProblems(limits, path, REGIMEN_FIELD_LABELS[field])));
    }
  });
  problems.push(...populationProblems(rules));
  return problems;
}

/** Each present limit (and a dose's ceiling) must be a finite number from 0 to its field's bound (limit-bounds.ts). */
export function limitRangeProblems(field: RegimenField, limits: Limits, path: string, label?: string): RuleProblem[] {
  const problems: RuleProblem[] = [];
  for (const key of LIMIT_KEYS) {
    const value = limits[key];
    if (value === null || value === undefined) continue;
    const problem = limitValueProblem(field, value, label);
    if (problem) problems.push({ path: `${path}.${key}`, message: problem });
  }
  // A per-kg rule's absolute ceiling is a dose in the dose unit: the same bound (rule-population.ts checks the rest).
  const ceiling = limits.ceiling;
  if (typeof ceiling === 'number' && Number.isFinite(ceiling) && field !== 'lockoutMinutes') {
    const problem = limitValueProblem(field, ceiling, label);
    if (problem) problems.push({ path: `${path}.ceiling`, message: problem });
  }
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
