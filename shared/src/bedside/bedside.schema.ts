import type { z } from 'zod';
import type { Reconciliation } from '../dose/reconcile.js';
import { REGIMEN_FIELD_LABELS, REGIMEN_FIELDS } from '../dose/regimen-fields.js';
import type { RegimenField } from '../dose/types.js';
import type { pumpSettingsSchema } from './bedside-requests.schema.js';

/** What a nurse reads off the programmed pump and the syringe, entered independently by each nurse. */
export type PumpSettings = z.infer<typeof pumpSettingsSchema>;

/** What the pump holds of the order: the drug, concentration and syringe, then the regimen fields a pump is set with (every one but the clinician bolus, which a nurse gives). */
export const PUMP_SETTING_FIELDS: readonly (keyof PumpSettings)[] = [
  'drugId',
  'concentrationPerMl',
  'syringeVolumeMl',
  ...REGIMEN_FIELDS.filter((field): field is Exclude<RegimenField, 'clinicianBolusDose'> => field !== 'clinicianBolusDose'),
];

export const PUMP_SETTING_LABELS: Record<keyof PumpSettings, string> = {
  drugId: 'Drug',
  concentrationPerMl: 'Concentration',
  syringeVolumeMl: 'Syringe volume',
  ...(Object.fromEntries(PUMP_SETTING_FIELDS.slice(3).map((field) => [field, REGIMEN_FIELD_LABELS[field as RegimenField]])) as Record<
    Exclude<RegimenField, 'clinicianBolusDose'>,
    string
  >),
};

export type CheckStatus = 'awaiting_second' | 'matched' | 'mismatch';

/** Whose entry differs from the order: the first nurse's, the second's, or both. */
export type SettingDifference = {
  field: keyof PumpSettings;
  first: number | null;
  second: number | null;
  ordered: number | null;
  differs: 'first' | 'second' | 'both';
};

export type FirstCheckResponse = { id: number; status: 'awaiting_second' };
export type SecondCheckResponse = { id: number; status: 'matched' | 'mismatch'; differences: SettingDifference[] };

export type ReconciliationResponse = Reconciliation & { dispensedMl: number; infusedMl: number; wastedMl: number };
