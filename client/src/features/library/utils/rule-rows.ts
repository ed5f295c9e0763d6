import {
  formatLimit as formatStoredLimit,
  LIMIT_KEYS,
  REGIMEN_FIELD_LABELS,
  REGIMEN_FIELDS,
  regimenFieldUnit,
  ruleLabel,
  tallMan,
  type DiffLimitKey,
  type DoseUnit,
  type LimitKey,
  type NamedRule,
  type RegimenField,
} from '@lockstep/shared';

/** What the screens need of a rule: the saved (`LimitRuleResponse`) and parsed (`NamedRule`) kinds both fit. */
export type RuleView = Pick<NamedRule, 'drugId' | 'drugName' | 'concentrationPerMl' | 'doseUnit' | 'perKg' | 'limits'> &
  Partial<Pick<NamedRule, 'population' | 'minAgeYears' | 'maxAgeYears' | 'minWeightKg' | 'maxWeightKg'>>;

export const LIMIT_LABELS: Record<LimitKey, string> = {
  hardMin: 'Hard min',
  softMin: 'Soft min',
  softMax: 'Soft max',
  hardMax: 'Hard max',
};

/** The limits a diff row can name: the four and a per-kg rule's absolute ceiling. */
export const DIFF_LIMIT_LABELS: Record<DiffLimitKey, string> = { ...LIMIT_LABELS, ceiling: 'Ceiling' };

export interface ParameterRow {
  field: RegimenField;
  label: string;
  /** e.g. 'mg', 'mcg/kg', 'mg/h', 'min'. */
  unit: string;
  /** Each limit in safe display form ('0.5 mg'), or null where the limit is not set. */
  limits: Record<LimitKey, string | null>;
  /** A per-kg rule's absolute ceiling for the field, in the dose unit ('1.5 mg'), or null. */
  ceiling: string | null;
}

/** "HYDROmorphone 0.2 mg/mL": tall-man name and the concentration in safe form. */
export function ruleTitle(rule: { drugName: string; concentrationPerMl: number; doseUnit: string }): string {
  return ruleLabel(tallMan(rule.drugName), rule.concentrationPerMl, rule.doseUnit);
}

export function isDoseUnit(unit: string): unit is DoseUnit {
  return unit === 'mg' || unit === 'mcg';
}

/** A limit value with the unit of its parameter, to its full stored precision (never rounded), or null when it is not set. */
export function formatLimit(value: number | null | undefined, field: RegimenField, doseUnit: DoseUnit, perKg: boolean): string | null {
  if (value === null || value === undefined) return null;
  return formatStoredLimit(value, regimenFieldUnit(field, doseUnit, perKg));
}

/** One row per parameter the rule limits, in order-form order; parameters with no limit are left out. */
export function parameterRows(rule: RuleView): ParameterRow[] {
  const rows: ParameterRow[] = [];
  for (const field of REGIMEN_FIELDS) {
    const limits = rule.limits[field];
    if (!limits || LIMIT_KEYS.every((key) => limits[key] === null || limits[key] === undefined)) continue;
    rows.push({
      field,
      label: REGIMEN_FIELD_LABELS[field],
      unit: regimenFieldUnit(field, rule.doseUnit, rule.perKg),
      limits: {
        hardMin: formatLimit(limits.hardMin, field, rule.doseUnit, rule.perKg),
        softMin: formatLimit(limits.softMin, field, rule.doseUnit, rule.perKg),
        softMax: formatLimit(limits.softMax, field, rule.doseUnit, rule.perKg),
        hardMax: formatLimit(limits.hardMax, field, rule.doseUnit, rule.perKg),
      },
      ceiling: rule.perKg ? formatLimit(limits.ceiling, field, rule.doseUnit, false) : null,
    });
  }
  return rows;
}
