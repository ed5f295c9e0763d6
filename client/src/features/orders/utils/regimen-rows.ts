import {
  formatDose,
  REGIMEN_FIELD_LABELS,
  REGIMEN_FIELDS,
  regimenFieldUnit,
  tallMan,
  type Finding,
  type FindingSeverity,
  type OrderDetail,
  type OrderSummary,
} from '@lockstep/shared';
import { formatCalendarDate } from '@/utils/format-date';
import { changedFields, type DiffField } from './order-diff';
import { fieldValueText, formatRange } from './regimen-format';

/** One line of the order-against-rule table. */
export type RegimenRow = {
  field: DiffField;
  /** Regimen amounts have limits; drug, concentration, indication and review date do not. */
  limited: boolean;
  /** False for an optional amount left empty. */
  set: boolean;
  label: string;
  ordered: string;
  /** The ordered amount per kg, where the rule's limits are per kg and the weight is known. */
  perKg: string | null;
  soft: string | null;
  hard: string | null;
  /** The previous version's value, when there is one. */
  previous: string | null;
  changed: boolean;
  /** The worst finding on this field, if any. */
  worst: FindingSeverity | null;
};

const OTHER_LABELS = { drug: 'Drug', concentrationPerMl: 'Concentration', indication: 'Indication', reviewDate: 'Review date' } as const;

const SEVERITY_RANK: Record<FindingSeverity, number> = { error: 0, hard: 1, soft: 2, caution: 3 };
const FIELD_OF_FINDING: Partial<Record<string, DiffField>> = {
  concentrationPerMl: 'concentrationPerMl',
  doseUnit: 'concentrationPerMl',
  drugId: 'drug',
};

function worstFinding(findings: readonly Finding[], field: DiffField): FindingSeverity | null {
  const severities = findings
    .filter((finding) => (FIELD_OF_FINDING[finding.field] ?? finding.field) === field)
    .map((finding) => finding.severity);
  if (severities.length === 0) return null;
  return severities.sort((a, b) => SEVERITY_RANK[a] - SEVERITY_RANK[b])[0];
}

function valueText(field: DiffField, order: OrderSummary): string {
  switch (field) {
    case 'drug':
      return tallMan(order.drugName);
    case 'concentrationPerMl':
      return formatDose(order.concentrationPerMl, `${order.doseUnit}/mL`);
    case 'indication':
      return order.indication.trim() || 'Not given';
    case 'reviewDate':
      return formatCalendarDate(order.reviewDate);
    default:
      return fieldValueText(field, order[field], order.doseUnit);
  }
}

/**
 * The order field by field beside its limit rule (the snapshot signed against), with the amount
 * per kg for a per-kg rule, the previous version's value and whether it changed.
 */
export function regimenRows(order: OrderDetail, previous: OrderSummary | null, weightKg: number | null): RegimenRow[] {
  const changed = previous ? changedFields(previous, order) : new Set<DiffField>();
  const rule = order.rule;
  const fields: DiffField[] = ['drug', 'concentrationPerMl', ...REGIMEN_FIELDS, 'indication', 'reviewDate'];
  return fields.map((field) => {
    const isRegimen = (REGIMEN_FIELDS as readonly string[]).includes(field);
    const regimenField = isRegimen ? (field as (typeof REGIMEN_FIELDS)[number]) : null;
    const limits = regimenField ? rule?.limits[regimenField] : undefined;
    const perKgRule = Boolean(rule?.perKg) && regimenField !== null && regimenField !== 'lockoutMinutes';
    const limitUnit = regimenField ? regimenFieldUnit(regimenField, order.doseUnit, perKgRule) : '';
    const value = regimenField ? order[regimenField] : null;
    const perKg =
      perKgRule && regimenField && value !== null && weightKg !== null && weightKg > 0 ? formatDose(value / weightKg, limitUnit) : null;
    return {
      field,
      limited: regimenField !== null,
      set: regimenField === null || value !== null,
      label: regimenField ? REGIMEN_FIELD_LABELS[regimenField] : OTHER_LABELS[field as keyof typeof OTHER_LABELS],
      ordered: valueText(field, order),
      perKg,
      soft: limits ? formatRange(limits.softMin, limits.softMax, limitUnit) : null,
      hard: limits ? formatRange(limits.hardMin, limits.hardMax, limitUnit) : null,
      previous: previous ? valueText(field, previous) : null,
      changed: changed.has(field),
      worst: worstFinding(order.findings, field),
    };
  });
}
