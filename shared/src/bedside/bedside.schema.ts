import type { z } from 'zod';
import type { Reconciliation } from '../dose/reconcile.js';
import type { pumpSettingsSchema } from './bedside-requests.schema.js';

/** What a nurse reads off the programmed pump and the syringe, entered independently by each nurse. */
export type PumpSettings = z.infer<typeof pumpSettingsSchema>;

export const PUMP_SETTING_FIELDS: readonly (keyof PumpSettings)[] = [
  'drugId',
  'concentrationPerMl',
  'syringeVolumeMl',
  'loadingDose',
  'demandDose',
  'lockoutMinutes',
  'basalRatePerHour',
  'oneHourLimit',
  'fourHourLimit',
];

export const PUMP_SETTING_LABELS: Record<keyof PumpSettings, string> = {
  drugId: 'Drug',
  concentrationPerMl: 'Concentration',
  syringeVolumeMl: 'Syringe volume',
  loadingDose: 'Loading dose',
  demandDose: 'Demand dose',
  lockoutMinutes: 'Lockout',
  basalRatePerHour: 'Basal rate',
  oneHourLimit: '1-hour limit',
  fourHourLimit: '4-hour limit',
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
