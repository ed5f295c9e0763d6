import type { DoseUnit } from '../drugs/drug.schema.js';
import { type LimitCheck, checkAgainstRule } from './check-against-rule.js';
import { withoutFloatNoise } from './float-noise.js';
import { formatDose, formatLimit } from './format-dose.js';
import { isUsableNumber } from './order-number-findings.js';
import { DOSE_FIELDS, REGIMEN_FIELDS, REGIMEN_FIELD_LABELS, regimenFieldUnit } from './regimen-fields.js';
import type { Finding, LimitRule, Limits, Regimen, RegimenField } from './types.js';

export type LimitContext = {
  /** Weight for a per-kg rule; null when it is missing or unusable (no per-kg dose checks then). */
  weightKg: number | null;
  /** False when the regimen's dose unit is unusable or differs from the rule's: no dose checks. */
  doseUnitMatches: boolean;
};

type OutsideCheck = Exclude<LimitCheck, 'ok'>;

const LIMIT_WORDS: Readonly<Record<OutsideCheck, { side: string; limit: string; key: keyof Limits }>> = {
  'hard-low': { side: 'below', limit: 'hard minimum', key: 'hardMin' },
  'hard-high': { side: 'above', limit: 'hard maximum', key: 'hardMax' },
  'soft-low': { side: 'below', limit: 'soft minimum', key: 'softMin' },
  'soft-high': { side: 'above', limit: 'soft maximum', key: 'softMax' },
};

function limitMessage(field: RegimenField, check: OutsideCheck, value: number, limit: number, unit: string): string {
  const { side, limit: limitName } = LIMIT_WORDS[check];
  const shownValue = formatDose(value, unit);
  // The limit to its full stored precision, never rounded.
  const shownLimit = formatLimit(limit, unit);
  const label = REGIMEN_FIELD_LABELS[field];
  // Rounded for display, a value just past a limit can print the same as the limit: say so plainly.
  if (shownValue === formatDose(limit, unit)) return `${label} is just ${side} the ${limitName} ${shownLimit}`;
  return `${label} ${shownValue} is ${side} the ${limitName} ${shownLimit}`;
}

function fieldFinding(field: RegimenField, value: number, limits: Limits, unit: string): Finding | null {
  const check = checkAgainstRule(value, limits);
  if (check === 'ok') return null;
  const limit = limits[LIMIT_WORDS[check].key] ?? Number.NaN;
  return {
    field,
    severity: check.startsWith('hard') ? 'hard' : 'soft',
    code: `limit.${check}`,
    message: limitMessage(field, check, value, limit, unit),
  };
}

/**
 * Hard and soft limit findings for every regimen field the rule limits. With a per-kg rule, dose
 * fields are compared per kg of `context.weightKg`; the lockout never is. Fields whose value is
 * absent or unusable are skipped: their own error findings say what is wrong.
 */
export function limitFindings(r: Regimen, rule: LimitRule, doseUnit: DoseUnit, context: LimitContext): Finding[] {
  const findings: Finding[] = [];
  for (const field of REGIMEN_FIELDS) {
    const limits = rule.limits[field];
    const value = r[field];
    if (limits === undefined || !isUsableNumber(value)) continue;
    const isDose = DOSE_FIELDS.includes(field);
    if (isDose && !context.doseUnitMatches) continue;
    const perKg = isDose && rule.perKg;
    if (perKg && context.weightKg === null) continue;
    // Noise removal so 0.29 mg for 29 kg is 0.01 mg/kg exactly, not 0.009999999999999998.
    const compared = perKg && context.weightKg !== null ? withoutFloatNoise(value / context.weightKg) : value;
    const finding = fieldFinding(field, compared, limits, regimenFieldUnit(field, doseUnit, perKg));
    if (finding) findings.push(finding);
  }
  return findings;
}
