// Caution texts the screens show beside calculated values. Plain sentences; sources in comments.

/** docs/design.md, "Decision support": every screen that shows a dose calculation carries this. */
export const DECISION_SUPPORT_CAUTION =
  "Decision support only: check every value against the prescriber's order, local policy and licensed clinical judgement.";

/** docs/design.md, "Decision support": the limits and defaults shipped with Lockstep give way to the ward's own protocols. */
export const LOCAL_POLICY_CAUTION = 'Local protocols override the default limits and values shipped with Lockstep.';

/**
 * Shown with every oral morphine equivalent. Source: Fine & Portenoy, J Pain Symptom Manage
 * 2009;38(3):418-425 (reduce 25–50 % for incomplete cross-tolerance).
 */
export const CROSS_TOLERANCE_CAUTION =
  'Planning aid only. Cross-tolerance between opioids is incomplete: when switching opioids, reduce the calculated dose by 25–50 % and review the patient closely.';

// Patient-factor cautions raised by checkOrder.

/** ASHP Standardize 4 Safety, PCA standards (2023): basal rate only for opioid-tolerant patients. */
export const BASAL_OPIOID_NAIVE_CAUTION =
  'Basal rate ordered for an opioid-naive patient: a basal infusion is recommended only for opioid-tolerant patients. Confirm it is intended.';

export const SLEEP_APNOEA_CAUTION =
  'Sleep apnoea: higher risk of opioid-induced respiratory depression. Monitor sedation, breathing and SpO2 closely.';

export const AGE_70_OR_OVER_CAUTION =
  'Age 70 or over: higher risk of opioid-induced sedation and respiratory depression. Consider a lower dose and monitor closely.';

export const OTHER_SEDATIVES_CAUTION =
  'Other sedating medicines: opioid-induced sedation is more likely. Monitor sedation and breathing closely.';
