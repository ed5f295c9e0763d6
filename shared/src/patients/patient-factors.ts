import type { PatientAllergy, PatientFactors } from '../dose/types.js';
import { ageInMonths, ageInYears } from './age.js';
import { isOpioidTolerant } from './patient-display.js';
import type { Patient } from './patient.schema.js';

/**
 * The patient fields the order check reads; the server's entity (with its allergy entries loaded)
 * and the client's answer both have them.
 */
export type PatientForCheck = Pick<
  Patient,
  | 'dateOfBirth'
  | 'sex'
  | 'weightKg'
  | 'weightMeasuredOn'
  | 'opioidTolerant'
  | 'toleranceOralMorphineMgPerDay'
  | 'toleranceDays'
  | 'sleepApnoea'
  | 'otherSedatives'
> & { allergies: readonly PatientAllergy[] };

/**
 * A patient as the order check sees them on `today`: one function, so screen and server check the
 * same facts. Tolerance counts only with a basis that meets the definition (opioid-tolerance.ts);
 * a claim without one is checked as opioid naive. Throws when the allergy entries were not loaded,
 * so a missing relation can never read as "no allergies".
 */
export function patientFactorsOf(patient: PatientForCheck, today: Date): PatientFactors {
  if (!Array.isArray(patient.allergies)) throw new Error("patientFactorsOf: the patient's allergy entries were not loaded");
  const tolerant = isOpioidTolerant(patient);
  return {
    weightKg: patient.weightKg,
    weightMeasuredOn: patient.weightMeasuredOn,
    ageYears: ageInYears(patient.dateOfBirth, today),
    ageMonths: ageInMonths(patient.dateOfBirth, today),
    sex: patient.sex,
    opioidTolerant: tolerant,
    toleranceOralMorphineMgPerDay: tolerant ? patient.toleranceOralMorphineMgPerDay : null,
    sleepApnoea: patient.sleepApnoea,
    otherSedatives: patient.otherSedatives,
    allergies: patient.allergies.map(({ drugId, substance, reaction, severity }) => ({ drugId, substance, reaction, severity })),
  };
}
