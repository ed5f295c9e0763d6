import { AGE_65_OR_OVER_CAUTION, BASAL_OPIOID_NAIVE_CAUTION, OTHER_SEDATIVES_CAUTION, SLEEP_APNOEA_CAUTION } from './cautions.js';
import { ADULT_AGE_YEARS } from '../patients/adult-age.js';
import { isUsableNumber } from './order-number-findings.js';
import type { Finding, PatientFactors, Regimen } from './types.js';

/**
 * Age from which a patient's age raises a caution. The Joint Commission, Sentinel Event Alert 49,
 * Safe use of opioids in hospitals (2012), citing Cepeda et al. 2003: respiratory depression risk
 * rises from the sixties (2.8 times in ages 61–70). 65 as the threshold is common practice.
 */
export const OLDER_PATIENT_AGE_YEARS = 65;

function finding(field: string, severity: Finding['severity'], code: string, message: string): Finding {
  return { field, severity, code, message };
}

/**
 * Findings from the patient's risk factors:
 * - a basal rate for an opioid-naive adult (or a patient of unknown age) needs a reason, `soft` on
 *   the basal rate (Chou R et al., Management of Postoperative Pain, APS/ASRA/ASA guideline, J Pain
 *   2016;17(2):131-157: no routine basal infusion in opioid-naive adults, strong recommendation);
 *   for an opioid-naive child (under `ADULT_AGE_YEARS`, common practice) it is a caution, as that
 *   guideline is written for adults;
 * - sleep apnoea, age 65 or over and other sedatives are cautions on the field 'patient' (The
 *   Joint Commission, Sentinel Event Alert 49, 2012);
 * - several of them together need a reason: opioid-naive with sleep apnoea and other sedatives
 *   (`soft` on the demand dose), or age 65 or over with a basal rate (`soft` on the basal rate).
 *   Requiring a reason when risk factors combine is common practice; the factors are SEA 49's.
 * Soft findings sit on regimen fields, where the order form asks for the reason.
 */
export function patientCautions(r: Regimen, p: PatientFactors): Finding[] {
  const findings: Finding[] = [];
  const basal = isUsableNumber(r.basalRatePerHour) && r.basalRatePerHour > 0;
  const naive = !p.opioidTolerant;
  const age = typeof p.ageYears === 'number' && Number.isFinite(p.ageYears) ? p.ageYears : null;
  const child = age !== null && age < ADULT_AGE_YEARS;
  const older = age !== null && age >= OLDER_PATIENT_AGE_YEARS;

  if (basal && naive) {
    findings.push(
      child
        ? finding('basalRatePerHour', 'caution', 'caution.basal-opioid-naive', BASAL_OPIOID_NAIVE_CAUTION)
        : finding('basalRatePerHour', 'soft', 'risk.basal-opioid-naive', BASAL_OPIOID_NAIVE_CAUTION),
    );
  }
  if (basal && older) {
    findings.push(
      finding(
        'basalRatePerHour',
        'soft',
        'risk.older-with-basal',
        `Age ${age} with a basal rate: two risk factors for respiratory depression together. Give the reason the basal rate is needed.`,
      ),
    );
  }
  if (naive && p.sleepApnoea === true && p.otherSedatives === true) {
    findings.push(
      finding(
        'demandDose',
        'soft',
        'risk.naive-apnoea-sedatives',
        'Opioid-naive, with sleep apnoea and other sedating medicines: three risk factors for respiratory depression together. Give the reason for this regimen and plan close monitoring.',
      ),
    );
  }
  if (p.sleepApnoea === true) {
    findings.push(finding('patient', 'caution', 'caution.sleep-apnoea', SLEEP_APNOEA_CAUTION));
  }
  if (older) {
    findings.push(finding('patient', 'caution', 'caution.age-65-or-over', AGE_65_OR_OVER_CAUTION));
  }
  if (p.otherSedatives === true) {
    findings.push(finding('patient', 'caution', 'caution.other-sedatives', OTHER_SEDATIVES_CAUTION));
  }
  return findings;
}
