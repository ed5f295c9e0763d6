/** "OKAFOR, Grace": family name in capitals, so it cannot be mistaken for a given name. */
export function patientDisplayName(patient: { familyName: string; givenName: string }): string {
  return `${patient.familyName.toLocaleUpperCase('en-GB')}, ${patient.givenName}`;
}

const NO_ALLERGY_PHRASES = new Set(['', 'none', 'nil', 'nka', 'nkda', 'none known', 'no known allergies', 'no known drug allergies']);

/** True when the allergy text records an actual allergy rather than "none known". */
export function hasAllergies(allergies: string): boolean {
  const normalised = allergies
    .trim()
    .toLowerCase()
    .replace(/[.\s]+$/, '');
  return !NO_ALLERGY_PHRASES.has(normalised);
}

export type PatientRiskFactor = 'allergies' | 'opioid-tolerant' | 'sleep-apnoea' | 'other-sedatives';

export const PATIENT_RISK_FACTOR_LABELS: Readonly<Record<PatientRiskFactor, string>> = {
  allergies: 'Allergies',
  'opioid-tolerant': 'Opioid tolerant',
  'sleep-apnoea': 'Sleep apnoea',
  'other-sedatives': 'Other sedatives',
};

/** The patient's recorded risk factors for PCA, in the order screens show them. */
export function patientRiskFactors(patient: {
  allergies: string;
  opioidTolerant: boolean;
  sleepApnoea: boolean;
  otherSedatives: boolean;
}): PatientRiskFactor[] {
  const factors: PatientRiskFactor[] = [];
  if (hasAllergies(patient.allergies)) factors.push('allergies');
  if (patient.opioidTolerant) factors.push('opioid-tolerant');
  if (patient.sleepApnoea) factors.push('sleep-apnoea');
  if (patient.otherSedatives) factors.push('other-sedatives');
  return factors;
}
