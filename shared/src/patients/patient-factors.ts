import type { PatientFactors } from '../dose/types.js';
import { ageInMonths, ageInYears } from './age.js';
import type { Patient } from './patient.schema.js';

/** The patient fields the order check reads; the server's entity and the client's answer both have them. */
export type PatientForCheck = Pick<Patient, 'dateOfBirth' | 'sex' | 'weightKg' | 'opioidTolerant' | 'sleepApnoea' | 'otherSedatives'>;

/** A patient as the order check sees them on `today`: one function, so screen and server check the same facts. */
export function patientFactorsOf(patient: PatientForCheck, today: Date): PatientFactors {
  return {
    weightKg: patient.weightKg,
    ageYears: ageInYears(patient.dateOfBirth, today),
    ageMonths: ageInMonths(patient.dateOfBirth, today),
    sex: patient.sex,
    opioidTolerant: patient.opioidTolerant,
    sleepApnoea: patient.sleepApnoea,
    otherSedatives: patient.otherSedatives,
  };
}
