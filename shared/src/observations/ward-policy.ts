/** A ward's local monitoring and escalation settings. Defaults are starting points; local policy rules. */
export type WardPolicy = {
  /** Observation interval in the first 24 hours after a start or any regimen change. */
  observationIntervalFirst24hMinutes: number;
  observationIntervalMinutes: number;
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
  // Respiratory rate < 8/min is widely used [practice]; studies used < 10/min (Overdyk FJ et al., Anesth Analg
  // 2007;105(2):412-418) [memory].
  respiratoryRateThreshold: 8,
  // SpO2 < 90 % (Overdyk FJ et al., Anesth Analg 2007;105(2):412-418) [memory].
  spo2Threshold: 90,
  syringeLowThresholdHours: 2, // [practice]
  reconciliationToleranceMl: 0.5, // local setting [practice]
  painNotControlledScore: 7, // [practice]
  painNotControlledRatio: 2, // attempts per delivered dose [practice]
  // Weight-based doses use a current weight: 7 days is a local default [practice], no single published rule.
  weightMaxAgeDays: 7,
};
