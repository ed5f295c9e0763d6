import {
  formatDose,
  formatLimit,
  regimenFieldUnit,
  drugAndConcentration,
  type DoseUnit,
  type LimitRuleResponse,
  type Limits,
  type RegimenField,
} from '@lockstep/shared';

export function ruleLabel(rule: LimitRuleResponse): string {
  const label = drugAndConcentration(rule);
  return rule.perKg ? `${label} (limits per kg)` : label;
}

/** A regimen field's value with its unit, or "Not set" for an optional field left empty. */
export function fieldValueText(field: RegimenField, value: number | null | undefined, doseUnit: DoseUnit): string {
  if (value === null || value === undefined) return 'Not set';
  return formatDose(value, regimenFieldUnit(field, doseUnit, false));
}

/**
 * "0.5–2 mg", "up to 30 mg", "from 5 min"; null when neither end is set. Limits are shown to their
 * full stored precision (`formatLimit`), never rounded; pass `formatDose` for a range worked out
 * from them (per kg × weight).
 */
export function formatRange(
  low: number | null | undefined,
  high: number | null | undefined,
  unit: string,
  format: (amount: number, unit: string) => string = formatLimit,
): string | null {
  const hasLow = low !== null && low !== undefined;
  const hasHigh = high !== null && high !== undefined;
  if (hasLow && hasHigh) return `${format(low, '')}–${format(high, unit)}`;
  if (hasHigh) return `up to ${format(high, unit)}`;
  if (hasLow) return `from ${format(low, unit)}`;
  return null;
}

/**
 * The limits as a prescriber reads them beside the input: "Soft 0.5–2 mg · hard 0.2–3 mg". With a
 * per-kg rule and a weight, the soft range is also worked out for this patient.
 */
export function limitRangeText(
  field: RegimenField,
  limits: Limits | undefined,
  doseUnit: DoseUnit,
  perKg: boolean,
  weightKg: number | null,
): string | null {
  if (!limits) return null;
  const isPerKg = perKg && field !== 'lockoutMinutes';
  const unit = regimenFieldUnit(field, doseUnit, isPerKg);
  const soft = formatRange(limits.softMin, limits.softMax, unit);
  const hard = formatRange(limits.hardMin, limits.hardMax, unit);
  const parts: string[] = [];
  if (soft) parts.push(`Soft ${soft}`);
  if (hard) parts.push(`hard ${hard}`);
  if (parts.length === 0) return null;
  let text = parts.join(' · ');
  if (isPerKg && weightKg !== null && weightKg > 0 && soft) {
    const forPatient = formatRange(
      limits.softMin === null || limits.softMin === undefined ? null : limits.softMin * weightKg,
      limits.softMax === null || limits.softMax === undefined ? null : limits.softMax * weightKg,
      regimenFieldUnit(field, doseUnit, false),
      formatDose,
    );
    text += ` (soft ${forPatient} for ${formatDose(weightKg, 'kg')})`;
  }
  return text.charAt(0).toUpperCase() + text.slice(1);
}
