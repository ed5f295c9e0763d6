import { AGE_70_OR_OVER_CAUTION, BASAL_OPIOID_NAIVE_CAUTION, OTHER_SEDATIVES_CAUTION, SLEEP_APNOEA_CAUTION } from './cautions.js';
import { isUsableNumber } from './order-number-findings.js';
import type { Finding, PatientFactors, Regimen } from './types.js';

const OLDER_PATIENT_AGE_YEARS = 70;

function caution(field: string, code: string, message: string): Finding {
  return { field, severity: 'caution', code, message };
}

/**
 * Cautions from the patient's risk factors: a basal rate for an opioid-naive patient (on the
 * basal rate field); sleep apnoea, age 70 or over and other sedatives (on the field 'patient').
 */
export function patientCautions(r: Regimen, p: PatientFactors): Finding[] {
  const findings: Finding[] = [];
  if (isUsableNumber(r.basalRatePerHour) && r.basalRatePerHour > 0 && !p.opioidTolerant) {
    findings.push(caution('basalRatePerHour', 'caution.basal-opioid-naive', BASAL_OPIOID_NAIVE_CAUTION));
  }
  if (p.sleepApnoea === true) {
    findings.push(caution('patient', 'caution.sleep-apnoea', SLEEP_APNOEA_CAUTION));
  }
  if (typeof p.ageYears === 'number' && p.ageYears >= OLDER_PATIENT_AGE_YEARS) {
    findings.push(caution('patient', 'caution.age-70-or-over', AGE_70_OR_OVER_CAUTION));
  }
  if (p.otherSedatives === true) {
    findings.push(caution('patient', 'caution.other-sedatives', OTHER_SEDATIVES_CAUTION));
  }
  return findings;
}
