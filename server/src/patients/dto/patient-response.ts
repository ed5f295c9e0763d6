import { sortAllergies, type Patient as PatientResponse, type PatientAllergyEntry } from '@lockstep/shared';
import type { PatientAllergy } from '../entities/patient-allergy.entity.js';
import type { Patient } from '../entities/patient.entity.js';

/** Expects `recordedBy` to be loaded. */
function toPatientAllergyResponse(allergy: PatientAllergy): PatientAllergyEntry {
  return {
    id: allergy.id,
    drugId: allergy.drugId,
    substance: allergy.substance,
    reaction: allergy.reaction,
    severity: allergy.severity,
    recordedByName: allergy.recordedBy?.displayName ?? null,
    recordedAt: allergy.recordedAt ? allergy.recordedAt.toISOString() : null,
  };
}

/** Expects `ward` and `allergies` (with `recordedBy`) to be loaded; allergies most severe first. */
export function toPatientResponse(patient: Patient): PatientResponse {
  return {
    id: patient.id,
    mrn: patient.mrn,
    givenName: patient.givenName,
    familyName: patient.familyName,
    dateOfBirth: patient.dateOfBirth,
    sex: patient.sex,
    weightKg: patient.weightKg,
    weightMeasuredOn: patient.weightMeasuredOn,
    allergies: sortAllergies(patient.allergies.map(toPatientAllergyResponse)),
    noKnownAllergies: patient.noKnownAllergies,
    opioidTolerant: patient.opioidTolerant,
    toleranceOralMorphineMgPerDay: patient.toleranceOralMorphineMgPerDay,
    toleranceDays: patient.toleranceDays,
    spo2Scale: patient.spo2Scale,
    sleepApnoea: patient.sleepApnoea,
    otherSedatives: patient.otherSedatives,
    wardId: patient.wardId,
    wardName: patient.ward.name,
    bed: patient.bed,
  };
}
