import {
  DEFAULT_WARD_POLICY,
  formatDose,
  type UpdateWardPolicyRequest,
  WARD_POLICY_FLOORS as FLOORS,
  type WardPolicy,
  type WardPolicySettings,
} from '@lockstep/shared';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';

export type PolicyNumberKey = keyof WardPolicy;
export type PolicyEmailKey = 'pharmacyEmail' | 'nurseInChargeEmail';

export type PolicyFormValues = Record<PolicyNumberKey, NumberFieldValue> & Record<PolicyEmailKey, string>;

export type PolicyGroup = 'intervals' | 'escalation' | 'syringe' | 'weight';

export interface PolicyNumberField {
  key: PolicyNumberKey;
  group: PolicyGroup;
  label: string;
  /** Shown after the value: 'min', '/min', '%', 'h', 'mL'. */
  unit: string;
  help: string;
  min: number;
  max: number;
  integer: boolean;
  // The server's own words for each problem.
  below: string;
  above: string;
  notWhole: string;
}

// In the order the form shows them. Ranges are the server's (PATCH /api/wards/:wardId/policy).
export const POLICY_NUMBER_FIELDS: readonly PolicyNumberField[] = [
  {
    key: 'observationIntervalFirst24hMinutes',
    group: 'intervals',
    label: 'First 24 hours',
    unit: 'min',
    help: 'Between observations after a PCA starts or its regimen changes',
    min: 15,
    max: FLOORS.observationIntervalFirst24hMinutes.max,
    integer: true,
    below: 'At least 15 minutes',
    above: FLOORS.observationIntervalFirst24hMinutes.message,
    notWhole: 'A whole number of minutes',
  },
  {
    key: 'observationIntervalMinutes',
    group: 'intervals',
    label: 'After the first 24 hours',
    unit: 'min',
    help: 'Between observations once the first day has passed',
    min: 15,
    max: FLOORS.observationIntervalMinutes.max,
    integer: true,
    below: 'At least 15 minutes',
    above: FLOORS.observationIntervalMinutes.message,
    notWhole: 'A whole number of minutes',
  },
  {
    key: 'closeObservationIntervalMinutes',
    group: 'intervals',
    label: 'Close observation every',
    unit: 'min',
    help: 'Between observations after a start, loading dose, clinician bolus, regimen or syringe change, an urgent flag or naloxone',
    min: 5,
    max: FLOORS.closeObservationIntervalMinutes.max,
    integer: true,
    below: 'At least 5 minutes',
    above: FLOORS.closeObservationIntervalMinutes.message,
    notWhole: 'A whole number of minutes',
  },
  {
    key: 'closeObservationPeriodMinutes',
    group: 'intervals',
    label: 'Close observation lasts',
    unit: 'min',
    help: 'After a start, loading dose, clinician bolus, regimen or syringe change, until a reading taken after it',
    min: FLOORS.closeObservationPeriodMinutes.min,
    max: 240,
    integer: true,
    below: FLOORS.closeObservationPeriodMinutes.message,
    above: 'At most 240 minutes',
    notWhole: 'A whole number of minutes',
  },
  {
    key: 'naloxoneClosePeriodMinutes',
    group: 'intervals',
    label: 'Close observation after naloxone lasts',
    unit: 'min',
    help: 'Naloxone can wear off before the opioid, so sedation and slow breathing can return',
    min: FLOORS.naloxoneClosePeriodMinutes.min,
    max: 720,
    integer: true,
    below: FLOORS.naloxoneClosePeriodMinutes.message,
    above: 'At most 720 minutes',
    notWhole: 'A whole number of minutes',
  },
  {
    key: 'respiratoryRateThreshold',
    group: 'escalation',
    label: 'Respiratory rate below',
    unit: '/min',
    help: 'A lower rate raises an urgent flag and e-mails the prescriber and nurse in charge',
    min: FLOORS.respiratoryRateThreshold.min,
    max: 20,
    integer: true,
    below: FLOORS.respiratoryRateThreshold.message,
    above: 'At most 20 per minute',
    notWhole: 'A whole number per minute',
  },
  {
    key: 'spo2Threshold',
    group: 'escalation',
    label: 'SpO2 below',
    unit: '%',
    help: 'A lower SpO2 raises an urgent flag and e-mails the prescriber and nurse in charge',
    min: FLOORS.spo2Threshold.min,
    max: 100,
    integer: true,
    below: FLOORS.spo2Threshold.message,
    above: 'At most 100 %',
    notWhole: 'A whole number of %',
  },
  {
    key: 'painNotControlledScore',
    group: 'escalation',
    label: 'Pain not controlled: pain score from',
    unit: '/10',
    help: 'With the ratio below, raises a review flag',
    min: 0,
    max: 10,
    integer: true,
    below: 'Pain score is 0 to 10',
    above: 'Pain score is 0 to 10',
    notWhole: 'A whole pain score',
  },
  {
    key: 'painNotControlledRatio',
    group: 'escalation',
    label: 'Pain not controlled: attempts per delivered dose from',
    unit: 'attempts per dose',
    help: 'Since the last observation, together with the pain score above',
    min: 1,
    max: 20,
    integer: false,
    below: 'At least 1',
    above: 'At most 20',
    notWhole: '',
  },
  {
    key: 'syringeLowThresholdHours',
    group: 'syringe',
    label: 'Syringe low when projected empty within',
    unit: 'h',
    help: 'Raises a review flag and e-mails pharmacy for the next syringe',
    min: 0.5,
    max: 24,
    integer: false,
    below: 'At least 0.5 hours',
    above: 'At most 24 hours',
    notWhole: '',
  },
  {
    key: 'reconciliationToleranceMl',
    group: 'syringe',
    label: 'Reconciliation tolerance',
    unit: 'mL',
    help: 'A larger discrepancy between dispensed and infused plus wasted is reported to pharmacy',
    min: 0,
    max: 10,
    integer: false,
    below: 'Cannot be negative',
    above: 'At most 10 mL',
    notWhole: '',
  },
  {
    key: 'weightMaxAgeDays',
    group: 'weight',
    label: 'Weight out of date after',
    unit: 'days',
    help: "An older weight is a caution on a child's or weight-based order: weigh the patient again",
    min: 1,
    max: 365,
    integer: true,
    below: 'At least 1 day',
    above: 'At most 365 days',
    notWhole: 'A whole number of days',
  },
];

export const POLICY_EMAIL_FIELDS: readonly { key: PolicyEmailKey; label: string; help: string }[] = [
  { key: 'nurseInChargeEmail', label: 'Nurse in charge', help: 'Receives urgent flags with the prescriber' },
  { key: 'pharmacyEmail', label: 'Pharmacy', help: 'Receives syringe-low notices and reconciliation reports' },
];

/** "60 min", "8/min", "90 %", "0.5 mL": the number in safe format, then the unit. */
export function formatPolicyValue(field: Pick<PolicyNumberField, 'unit'>, value: number): string {
  const number = formatDose(value, '');
  return field.unit.startsWith('/') ? `${number}${field.unit}` : `${number} ${field.unit}`;
}

/** The shipped default of a value, as shown beside it. */
export function shippedDefault(field: PolicyNumberField): string {
  return formatPolicyValue(field, DEFAULT_WARD_POLICY[field.key]);
}

export function policyToForm(policy: WardPolicySettings): PolicyFormValues {
  return { ...policy };
}

export function policyNumberError(field: PolicyNumberField, value: NumberFieldValue): string | null {
  const number = readNumber(value);
  if (number === null) return 'Enter a value';
  if (number === undefined) return 'Enter a number';
  if (field.integer && !Number.isInteger(number)) return field.notWhole;
  if (number < field.min) return field.below;
  if (number > field.max) return field.above;
  return null;
}

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export function emailError(value: string): string | null {
  const text = value.trim();
  return text === '' || EMAIL.test(text) ? null : 'Enter an e-mail address (or leave empty)';
}

export function validatePolicyForm(values: PolicyFormValues): Partial<Record<keyof PolicyFormValues, string>> {
  const errors: Partial<Record<keyof PolicyFormValues, string>> = {};
  for (const field of POLICY_NUMBER_FIELDS) {
    const error = policyNumberError(field, values[field.key]);
    if (error) errors[field.key] = error;
  }
  for (const { key } of POLICY_EMAIL_FIELDS) {
    const error = emailError(values[key]);
    if (error) errors[key] = error;
  }
  return errors;
}

/** Only what differs from the saved policy, as the PATCH body; call after the form is valid. */
export function policyChanges(values: PolicyFormValues, saved: WardPolicySettings): UpdateWardPolicyRequest {
  const changes: UpdateWardPolicyRequest = {};
  for (const { key } of POLICY_NUMBER_FIELDS) {
    const value = readNumber(values[key]);
    if (typeof value === 'number' && value !== saved[key]) changes[key] = value;
  }
  for (const { key } of POLICY_EMAIL_FIELDS) {
    const value = values[key].trim();
    if (value !== saved[key]) changes[key] = value;
  }
  return changes;
}
