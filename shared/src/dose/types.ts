import type { DoseUnit } from '../drugs/drug.schema.js';

/** Limits for one regimen parameter. Absent or null limits are not checked. */
export type Limits = {
  hardMin?: number | null;
  softMin?: number | null;
  softMax?: number | null;
  hardMax?: number | null;
  /**
   * Per-kg rules only: the most this field may ever be, in the dose unit itself (not per kg),
   * whatever the weight. Never above the adult rule's hard maximum for the same drug and concentration.
   */
  ceiling?: number | null;
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

export type AllergySeverity = 'intolerance' | 'allergy' | 'anaphylaxis';

/** One recorded allergy: a formulary drug (by id) or free text, the reaction and how bad it was. */
export type PatientAllergy = {
  drugId: number | null;
  substance: string;
  reaction: string;
  severity: AllergySeverity;
};

export type PatientFactors = {
  weightKg?: number | null;
  /** yyyy-mm-dd the weight was measured; null when not recorded. */
  weightMeasuredOn?: string | null;
  ageYears?: number | null;
  /** Whole months of age, for growth references in children. */
  ageMonths?: number | null;
  sex?: 'female' | 'male' | 'other' | 'unknown';
  opioidTolerant: boolean;
  /** The tolerance's basis: oral morphine mg a day taken for at least a week; null when naive or not recorded. */
  toleranceOralMorphineMgPerDay?: number | null;
  sleepApnoea?: boolean;
  otherSedatives?: boolean;
  allergies?: readonly PatientAllergy[];
};

/** What the check needs beyond regimen, rule and patient. Every field is optional so pure regimen checks stay simple. */
export type OrderCheckContext = {
  /** The ordered drug, matched against allergies by formulary id and name. */
  drug?: { id: number; genericName: string };
  /** yyyy-mm-dd the check runs on (weight age). */
  today?: string;
  /** The ward's rule for how old a weight may be, in days; null means the ward has none. */
  weightMaxAgeDays?: number | null;
  /** Clinician boluses allowed in 4 hours, counted in the pump's possible totals; 1 when not given. */
  clinicianBolusesPerFourHours?: number;
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
