import {
  checkOrder,
  REGIMEN_FIELD_LABELS,
  REGIMEN_FIELDS,
  type Finding,
  type LimitRuleResponse,
  type OrderDetail,
  type OrderFields,
  type OrderCheckContext,
  type PatientFactors,
  type Regimen,
  type RegimenField,
} from '@lockstep/shared';
import { readNumber } from '@/lib/number-input';

// The order form holds what was typed, as text: a dose is never silently rounded, stepped by an
// arrow key or reformatted while it is being entered. Reading turns it into numbers once.

export type OrderFormValues = {
  /** The chosen limit rule (drug + concentration) of the ward's active library. */
  ruleId: string | null;
  loadingDose: string;
  demandDose: string;
  lockoutMinutes: string;
  basalRatePerHour: string;
  oneHourLimit: string;
  fourHourLimit: string;
  clinicianBolusDose: string;
  indication: string;
  /** yyyy-mm-dd, as a date input gives it. */
  reviewDate: string;
  /** A reason per field outside a soft limit. */
  reasons: Record<RegimenField, string>;
  /** A reason per soft finding about something other than a regimen value (a recorded allergy on `drugId`, the weight), by field. */
  otherReasons: Record<string, string>;
};

export const REQUIRED_FIELDS: readonly RegimenField[] = ['demandDose', 'lockoutMinutes', 'basalRatePerHour'];

function emptyReasons(): Record<RegimenField, string> {
  return Object.fromEntries(REGIMEN_FIELDS.map((field) => [field, ''])) as Record<RegimenField, string>;
}

/** yyyy-mm-dd of the day after `today` in local time: PCA is reviewed at least daily. */
export function nextDay(today: Date): string {
  const date = new Date(today.getFullYear(), today.getMonth(), today.getDate() + 1);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}

export function emptyOrderForm(today: Date): OrderFormValues {
  return {
    ruleId: null,
    loadingDose: '',
    demandDose: '',
    lockoutMinutes: '',
    basalRatePerHour: '0',
    oneHourLimit: '',
    fourHourLimit: '',
    clinicianBolusDose: '',
    indication: '',
    reviewDate: nextDay(today),
    reasons: emptyReasons(),
    otherReasons: {},
  };
}

const SAME_CONCENTRATION = 1e-9;

export function ruleFor(rules: readonly LimitRuleResponse[], drugId: number, concentrationPerMl: number): LimitRuleResponse | undefined {
  return rules.find((rule) => rule.drugId === drugId && Math.abs(rule.concentrationPerMl - concentrationPerMl) < SAME_CONCENTRATION);
}

function text(value: number | null): string {
  return value === null ? '' : String(value);
}

/** A returned order's values, to revise: the same rule, numbers, and the reasons given before. */
export function valuesFromOrder(order: OrderDetail, rules: readonly LimitRuleResponse[], today: Date): OrderFormValues {
  const reasons = emptyReasons();
  const otherReasons: Record<string, string> = {};
  for (const override of order.overrides) {
    if ((REGIMEN_FIELDS as readonly string[]).includes(override.field)) reasons[override.field as RegimenField] = override.reason;
    else otherReasons[override.field] = override.reason;
  }
  const rule = ruleFor(rules, order.drugId, order.concentrationPerMl);
  return {
    ruleId: rule ? String(rule.id) : null,
    loadingDose: text(order.loadingDose),
    demandDose: text(order.demandDose),
    lockoutMinutes: text(order.lockoutMinutes),
    basalRatePerHour: text(order.basalRatePerHour),
    oneHourLimit: text(order.oneHourLimit),
    fourHourLimit: text(order.fourHourLimit),
    clinicianBolusDose: text(order.clinicianBolusDose),
    indication: order.indication,
    // A review date already past is no use for the new version.
    reviewDate: order.reviewDate > nextDay(today) ? order.reviewDate : nextDay(today),
    reasons,
    otherReasons,
  };
}

/** '' is "not entered" (null); a plain decimal is a number; anything else is NaN, so the order check shows it. */
export function readAmount(value: string): number | null {
  const amount = readNumber(value);
  return amount === undefined ? Number.NaN : amount;
}

export type ReadOrderForm = {
  /** For the local check: unreadable numbers are NaN, so they show as findings. */
  regimen: Regimen;
  /** Required fields left empty. */
  missing: RegimenField[];
  /** What the API takes; null until a rule is chosen and every number reads. */
  fields: OrderFields | null;
};

export function readOrderForm(values: OrderFormValues, rule: LimitRuleResponse | null, patientId: number): ReadOrderForm {
  const amounts = {} as Record<RegimenField, number | null>;
  const missing: RegimenField[] = [];
  for (const field of REGIMEN_FIELDS) {
    const amount = readAmount(values[field]);
    if (amount === null && REQUIRED_FIELDS.includes(field)) missing.push(field);
    amounts[field] = amount;
  }
  const required = (field: RegimenField) => amounts[field] ?? Number.NaN;
  const regimen: Regimen = {
    doseUnit: rule?.doseUnit ?? 'mg',
    concentrationPerMl: rule?.concentrationPerMl ?? Number.NaN,
    loadingDose: amounts.loadingDose,
    demandDose: required('demandDose'),
    lockoutMinutes: required('lockoutMinutes'),
    basalRatePerHour: required('basalRatePerHour'),
    oneHourLimit: amounts.oneHourLimit,
    fourHourLimit: amounts.fourHourLimit,
    clinicianBolusDose: amounts.clinicianBolusDose,
  };
  const unreadable = REGIMEN_FIELDS.some((field) => Number.isNaN(amounts[field] ?? 0));
  const indication = values.indication.trim();
  const fields: OrderFields | null =
    rule && !unreadable && missing.length === 0
      ? {
          patientId,
          drugId: rule.drugId,
          ...regimen,
          concentrationPerMl: rule.concentrationPerMl,
          doseUnit: rule.doseUnit,
          ...(indication ? { indication } : {}),
        }
      : null;
  return { regimen, missing, fields };
}

/**
 * The same check the server runs, here on every keystroke: `checkOrder` against the rule and the
 * patient. A required field left empty reads "… is required" rather than "… must be a number".
 */
export function localFindings(
  read: ReadOrderForm,
  rule: LimitRuleResponse,
  factors: PatientFactors,
  context: OrderCheckContext,
): Finding[] {
  const findings = checkOrder(read.regimen, { doseUnit: rule.doseUnit, perKg: rule.perKg, limits: rule.limits }, factors, context);
  return findings.map((finding) =>
    read.missing.includes(finding.field as RegimenField) && finding.code === 'number.not-finite'
      ? { ...finding, code: 'number.missing', message: `${REGIMEN_FIELD_LABELS[finding.field as RegimenField]} is required` }
      : finding,
  );
}
