import type { DoseUnit } from '../drugs/drug.schema.js';
import type { RegimenField } from './types.js';

/** Every limit-checked regimen field, in the order an order form shows them. */
export const REGIMEN_FIELDS: readonly RegimenField[] = [
  'loadingDose',
  'demandDose',
  'lockoutMinutes',
  'basalRatePerHour',
  'oneHourLimit',
  'fourHourLimit',
  'clinicianBolusDose',
];

/** Fields holding an amount of drug; a per-kg rule divides these by weight. Lockout is a time. */
export const DOSE_FIELDS: readonly RegimenField[] = REGIMEN_FIELDS.filter((field) => field !== 'lockoutMinutes');

export const REGIMEN_FIELD_LABELS: Readonly<Record<RegimenField, string>> = {
  loadingDose: 'Loading dose',
  demandDose: 'Demand dose',
  lockoutMinutes: 'Lockout',
  basalRatePerHour: 'Basal rate',
  oneHourLimit: '1-hour limit',
  fourHourLimit: '4-hour limit',
  clinicianBolusDose: 'Clinician bolus',
};

/** The display unit of a field's value, e.g. 'mg/h' for the basal rate or 'mcg/kg' per kg. */
export function regimenFieldUnit(field: RegimenField, doseUnit: DoseUnit, perKg: boolean): string {
  if (field === 'lockoutMinutes') return 'min';
  const amount = perKg ? `${doseUnit}/kg` : doseUnit;
  return field === 'basalRatePerHour' ? `${amount}/h` : amount;
}
