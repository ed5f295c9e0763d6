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

// Patient risk texts raised by checkOrder (patient-cautions.ts). Sources in docs/clinical-sources.md.

/**
 * Chou R et al., Management of Postoperative Pain: a clinical practice guideline from the American
 * Pain Society, ASRA and ASA, J Pain 2016;17(2):131-157: recommends against routine basal infusion
 * of opioids with IV PCA in opioid-naive adults (strong recommendation).
 */
export const BASAL_OPIOID_NAIVE_CAUTION =
  'Basal rate ordered for an opioid-naive patient: routine basal infusion with PCA is not recommended in opioid-naive adults (APS/ASRA/ASA guideline, 2016). Give the reason it is needed.';

/**
 * The Joint Commission, Sentinel Event Alert 49, Safe use of opioids in hospitals (2012): sleep
 * apnoea raises the risk of opioid-induced respiratory depression (from memory for the wording).
 */
export const SLEEP_APNOEA_CAUTION =
  'Sleep apnoea: higher risk of opioid-induced respiratory depression. Monitor sedation, breathing and SpO2 closely.';

/**
 * The Joint Commission, Sentinel Event Alert 49 (2012), citing Cepeda MS et al., Clin Pharmacol
 * Ther 2003;74(2):102-112: the risk of respiratory depression rises from the sixties (2.8 times
 * in ages 61–70). A caution from 65 is common practice.
 */
export const AGE_65_OR_OVER_CAUTION =
  'Age 65 or over: higher risk of opioid-induced sedation and respiratory depression. Consider a lower dose and monitor closely.';

/**
 * The Joint Commission, Sentinel Event Alert 49 (2012): other sedating medicines taken with opioids
 * raise the risk of oversedation (from memory for the wording).
 */
export const OTHER_SEDATIVES_CAUTION =
  'Other sedating medicines: opioid-induced sedation is more likely. Monitor sedation and breathing closely.';
