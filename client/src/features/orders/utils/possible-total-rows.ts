import {
  formatDose,
  formatLimit,
  type LimitRuleResponse,
  type OrderFields,
  POSSIBLE_WINDOW_LABELS,
  type PossibleWindow,
  possibleTotalsAgainstRule,
} from '@lockstep/shared';

/** Where a possible total stands against the rule's maximum for its window. */
export type PossibleTotalStatus = 'over-hard' | 'over-soft' | 'within' | 'no-limit';

export interface PossibleTotalRow {
  window: PossibleWindow;
  label: string;
  /** What the pump could give, e.g. '20 mg' or '11.76 mg (0.48 mg/kg)'. */
  total: string;
  /** The rule's maxima beside it, to full precision, e.g. 'soft 10 mg, hard 15 mg'; 'none in the rule' when unset. */
  limit: string;
  status: PossibleTotalStatus;
}

/**
 * The live panel's rows of what the pump could give in the first hour, any other hour, the first
 * 4 hours and any other 4 hours, each with the rule's maximum beside it: the shared
 * `possibleTotalsAgainstRule`, the same figures the order check's findings use. Empty until every
 * number reads and the rule (and for a per-kg rule, the weight) is known.
 */
export function possibleTotalRows(fields: OrderFields | null, rule: LimitRuleResponse | null, weightKg: number | null): PossibleTotalRow[] {
  if (!fields || !rule) return [];
  const rows = possibleTotalsAgainstRule(
    fields,
    { doseUnit: rule.doseUnit, perKg: rule.perKg, limits: rule.limits },
    { weightKg, doseUnitMatches: fields.doseUnit === rule.doseUnit },
  );
  const unit = rule.doseUnit;
  const limitUnit = rule.perKg ? `${unit}/kg` : unit;
  return rows.map((row) => {
    const limits = [
      row.softMax === null ? null : `soft ${formatLimit(row.softMax, limitUnit)}`,
      row.hardMax === null ? null : `hard ${formatLimit(row.hardMax, limitUnit)}`,
    ].filter((part): part is string => part !== null);
    const status: PossibleTotalStatus =
      row.check === 'hard-high' ? 'over-hard' : row.check === 'soft-high' ? 'over-soft' : limits.length === 0 ? 'no-limit' : 'within';
    return {
      window: row.window,
      label: POSSIBLE_WINDOW_LABELS[row.window],
      total:
        row.perKg === null ? formatDose(row.total.dose, unit) : `${formatDose(row.total.dose, unit)} (${formatDose(row.perKg, limitUnit)})`,
      limit: limits.length === 0 ? 'none in the rule' : limits.join(', '),
      status,
    };
  });
}
