import type { DoseUnit } from '../drugs/drug.schema.js';

/** Limits for one regimen parameter. Absent or null limits are not checked. */
export type Limits = {
  hardMin?: number | null;
  softMin?: number | null;
  softMax?: number | null;
  hardMax?: number | null;
};

export type RegimenField =
  'loadingDose' | 'demandDose' | 'lockoutMinutes' | 'basalRatePerHour' | 'oneHourLimit' | 'fourHourLimit' | 'clinicianBolusDose';

/**
 * A PCA regimen. Every dose is in `doseUnit`; concentration is `doseUnit` per mL; rates are per
 * hour; lockout is in minutes.
 */
export type Regimen = {
  doseUnit: DoseUnit;
  concentrationPerMl: number;
  loadingDose?: number | null;
  demandDose: number;
  lockoutMinutes: number;
  basalRatePerHour: number;
  oneHourLimit?: number | null;
  fourHourLimit?: number | null;
  clinicianBolusDose?: number | null;
};

/** One dose-limit library entry's limits. With `perKg`, dose limits are per kg of body weight. */
export type LimitRule = {
  doseUnit?: DoseUnit;
  perKg: boolean;
  limits: Partial<Record<RegimenField, Limits>>;
};

export type PatientFactors = {
  weightKg?: number | null;
  ageYears?: number | null;
  opioidTolerant: boolean;
  sleepApnoea?: boolean;
  otherSedatives?: boolean;
};

/** `hard` blocks signing, `soft` needs a reason, `error` is an order that cannot be right, `caution` informs. */
export type FindingSeverity = 'hard' | 'soft' | 'error' | 'caution';

export type Finding = {
  field: string;
  severity: FindingSeverity;
  code: string;
  message: string;
};

/** Cumulative pump totals at one moment. */
export type PumpReading = {
  at: string; // ISO time
  attempts: number;
  delivered: number;
  volumeInfusedMl: number;
};
