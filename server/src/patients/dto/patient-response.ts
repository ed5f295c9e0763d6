import type { Patient as PatientResponse } from '@lockstep/shared';
import type { Patient } from '../entities/patient.entity.js';

/** Expects `ward` to be loaded. */
export function toPatientResponse(patient: Patient): PatientResponse {
  return {
    id: patient.id,
    mrn: patient.mrn,
    givenName: patient.givenName,
    familyName: patient.familyName,
    dateOfBirth: patient.dateOfBirth,
    sex: patient.sex,
    weightKg: patient.weightKg,
    allergies: patient.allergies,
    opioidTolerant: patient.opioidTolerant,
    sleepApnoea: patient.sleepApnoea,
    otherSedatives: patient.otherSedatives,
    wardId: patient.wardId,
    wardName: patient.ward.name,
    bed: patient.bed,
  };
}
