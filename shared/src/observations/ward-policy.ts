/** A ward's local monitoring and escalation settings. Defaults are starting points; local policy rules. */
export type WardPolicy = {
  /** Observation interval in the first 24 hours after a start or any regimen change. */
  observationIntervalFirst24hMinutes: number;
  observationIntervalMinutes: number;
  /** Interval while close observation runs: after a start, loading dose, clinician bolus, regimen or syringe change, or an urgent flag. */
  closeObservationIntervalMinutes: number;
  /** How long close observation lasts after a start, loading dose, clinician bolus, regimen or syringe change. */
  closeObservationPeriodMinutes: number;
  /** How long close observation lasts after naloxone. */
  naloxoneClosePeriodMinutes: number;
  respiratoryRateThreshold: number;
  spo2Threshold: number;
  syringeLowThresholdHours: number;
  reconciliationToleranceMl: number;
  painNotControlledScore: number;
  painNotControlledRatio: number;
  /** A patient's weight older than this many days is a caution on a weight-based or child's order. */
  weightMaxAgeDays: number;
};

export const DEFAULT_WARD_POLICY: WardPolicy = {
  // No single fixed interval is published; ward policy sets it (ASPMN guideline, Jarzyna et al.,
  // Pain Manag Nurs 2011; Jungquist et al., 2020) [memory]. 60 / 120 minutes are local defaults.
  observationIntervalFirst24hMinutes: 60,
  observationIntervalMinutes: 120,
  // Every 15 minutes for the first hour after a start or any change that raises the opioid dose, and
  // after an urgent flag: common practice; the ASPMN guideline (Jarzyna D et al., American Society for
  // Pain Management Nursing guidelines on monitoring for opioid-induced sedation and respiratory
  // depression, Pain Manag Nurs 2011;12(3):118-145) says monitoring intensity follows risk, with no single interval.
  closeObservationIntervalMinutes: 15,
  closeObservationPeriodMinutes: 60,
  // Naloxone wears off before most opioids, so sedation can return: at least 2 hours of close
  // observation is common practice (no single published interval).
  naloxoneClosePeriodMinutes: 120,
  // Urgent below 9/min, i.e. at 8/min or below: NEWS2 scores a respiratory rate of 8 or below 3, the
  // single-parameter trigger for an urgent response (Royal College of Physicians, National Early Warning
  // Score (NEWS) 2, 2017). WARD_POLICY_FLOORS below keeps every ward at least this strict.
  respiratoryRateThreshold: 9,
  // Urgent below 92 %, i.e. at 91 % or below: NEWS2 SpO2 scale 1 scores 91 % or below 3 (Royal College of
  // Physicians, NEWS2, 2017).
  spo2Threshold: 92,
  syringeLowThresholdHours: 2, // [practice]
  reconciliationToleranceMl: 0.5, // local setting [practice]
  painNotControlledScore: 7, // [practice]
  painNotControlledRatio: 2, // attempts per delivered dose [practice]
  // Weight-based doses use a current weight: 7 days is a local default [practice], no single published rule.
  weightMaxAgeDays: 7,
};

/**
 * How far a ward may loosen its policy: a ward can tighten (flag earlier, observe more often) but never go
 * past these. Each names its source.
 */
export const WARD_POLICY_FLOORS = {
  /**
   * "Urgent below" must be at least 9/min, so 8/min or below is always urgent: NEWS2 scores a respiratory
   * rate of 8 or below 3 (Royal College of Physicians, National Early Warning Score (NEWS) 2, 2017).
   */
  respiratoryRateThreshold: {
    min: 9,
    message: 'At least 9 per minute: a rate of 8/min or below is always urgent (NEWS2, Royal College of Physicians 2017)',
  },
  /**
   * "Urgent below" must be at least 92 %, so 91 % or below is always urgent: NEWS2 SpO2 scale 1 scores 91 %
   * or below 3 (Royal College of Physicians, NEWS2, 2017).
   */
  spo2Threshold: {
    min: 92,
    message: 'At least 92 %: SpO2 of 91 % or below is always urgent (NEWS2 scale 1, Royal College of Physicians 2017)',
  },
  /**
   * Hourly at most in the first 24 hours: no single interval is published (ASPMN guideline, Jarzyna et al.,
   * Pain Manag Nurs 2011, from memory, leaves it to local policy); hourly is this product's stated default,
   * common practice.
   */
  observationIntervalFirst24hMinutes: {
    max: 60,
    message: 'At most 60 minutes: observations in the first 24 hours are at least hourly (common practice)',
  },
  /** Two-hourly at most afterwards: this product's stated default, common practice; no single published rule. */
  observationIntervalMinutes: {
    max: 120,
    message: 'At most 120 minutes: observations on a running PCA are at least two-hourly (common practice)',
  },
  /**
   * Close observation at least every 15 minutes: common practice. The ASPMN guideline (Jarzyna D et al.,
   * American Society for Pain Management Nursing guidelines on monitoring for opioid-induced sedation and
   * respiratory depression, Pain Manag Nurs 2011;12(3):118-145) says monitoring intensity follows risk and
   * gives no single interval.
   */
  closeObservationIntervalMinutes: {
    max: 15,
    message: 'At most 15 minutes: close observation is at least every 15 minutes (common practice)',
  },
  /** Close observation lasts at least the first hour after a start or a change that raises the dose: common practice, no single published rule. */
  closeObservationPeriodMinutes: {
    min: 60,
    message: 'At least 60 minutes: close observation lasts at least an hour (common practice)',
  },
  /**
   * At least 2 hours of close observation after naloxone: naloxone wears off before most opioids, so
   * sedation and slow breathing can return. Common practice; no single published interval.
   */
  naloxoneClosePeriodMinutes: {
    min: 120,
    message: 'At least 120 minutes: naloxone wears off before most opioids (common practice)',
  },
} as const;

/** Sedation 3 (frequently drowsy, drifts off mid-conversation) is always urgent, whatever the ward sets (POSS, Pasero C, 1994). */
export const SEDATION_ALWAYS_URGENT_AT = 3;

export type WardPolicyFloorField = keyof typeof WARD_POLICY_FLOORS;

/**
 * The settings in `policy` that loosen past a floor, each with the floor's own words. A value that is not a
 * finite number is reported too: it never means "no limit".
 */
export function wardPolicyFloorErrors(policy: Partial<WardPolicy>): Partial<Record<WardPolicyFloorField, string>> {
  const errors: Partial<Record<WardPolicyFloorField, string>> = {};
  for (const field of Object.keys(WARD_POLICY_FLOORS) as WardPolicyFloorField[]) {
    const value = policy[field];
    if (value === undefined) continue;
    const floor: { min?: number; max?: number; message: string } = WARD_POLICY_FLOORS[field];
    if (!Number.isFinite(value)) errors[field] = floor.message;
    else if (floor.min !== undefined && value < floor.min) errors[field] = floor.message;
    else if (floor.max !== undefined && value > floor.max) errors[field] = floor.message;
  }
  return errors;
}

/** A stored value below `min`, or one that is not a finite number, is held at `min`. */
const atLeast = (value: number, min: number) => (Number.isFinite(value) ? Math.max(value, min) : min);
/** A stored value above `max`, or one that is not a finite number, is held at `max`. */
const atMost = (value: number, max: number) => (Number.isFinite(value) ? Math.min(value, max) : max);

/**
 * The policy a ward works to: any stored setting past a floor (a ward saved before the floors existed) is
 * held at the floor, so a looser value is never used; a value that is not a finite number is held at the floor too.
 */
export function withWardPolicyFloors<T extends WardPolicy>(policy: T): T {
  const F = WARD_POLICY_FLOORS;
  return {
    ...policy,
    respiratoryRateThreshold: atLeast(policy.respiratoryRateThreshold, F.respiratoryRateThreshold.min),
    spo2Threshold: atLeast(policy.spo2Threshold, F.spo2Threshold.min),
    observationIntervalFirst24hMinutes: atMost(policy.observationIntervalFirst24hMinutes, F.observationIntervalFirst24hMinutes.max),
    observationIntervalMinutes: atMost(policy.observationIntervalMinutes, F.observationIntervalMinutes.max),
    closeObservationIntervalMinutes: atMost(policy.closeObservationIntervalMinutes, F.closeObservationIntervalMinutes.max),
    closeObservationPeriodMinutes: atLeast(policy.closeObservationPeriodMinutes, F.closeObservationPeriodMinutes.min),
    naloxoneClosePeriodMinutes: atLeast(policy.naloxoneClosePeriodMinutes, F.naloxoneClosePeriodMinutes.min),
  };
}
