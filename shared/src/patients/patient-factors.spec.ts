import { describe, expect, it } from 'vitest';
import { patientFactorsOf, type PatientForCheck } from './patient-factors.js';

const patient: PatientForCheck = {
  dateOfBirth: '1960-05-01',
  sex: 'female',
  weightKg: 70,
  weightMeasuredOn: '2026-12-01',
  opioidTolerant: true,
  toleranceOralMorphineMgPerDay: 90,
  toleranceDays: 30,
  sleepApnoea: false,
  otherSedatives: true,
  allergies: [{ drugId: 1, substance: 'Morphine', reaction: 'itch', severity: 'intolerance' }],
};
const today = new Date('2026-12-03T10:00:00Z');

describe('patientFactorsOf', () => {
  it('carries the allergies, the weight’s date and the tolerance basis to the check', () => {
    const factors = patientFactorsOf(patient, today);
    expect(factors).toMatchObject({
      weightKg: 70,
      weightMeasuredOn: '2026-12-01',
      ageYears: 66,
      opioidTolerant: true,
      toleranceOralMorphineMgPerDay: 90,
      allergies: [{ drugId: 1, substance: 'Morphine', reaction: 'itch', severity: 'intolerance' }],
    });
  });

  // US FDA definition of opioid tolerance (opioid analgesic labelling): >= 60 mg oral morphine a day for >= 1 week.
  it('checks a tolerance claim without a basis that meets the definition as opioid naive', () => {
    const factors = patientFactorsOf({ ...patient, toleranceOralMorphineMgPerDay: 40 }, today);
    expect(factors.opioidTolerant).toBe(false);
    expect(factors.toleranceOralMorphineMgPerDay).toBeNull();
  });

  it('refuses to run without the allergy entries, so a missing relation never reads as none', () => {
    expect(() => patientFactorsOf({ ...patient, allergies: undefined as never }, today)).toThrow(/allergy entries/);
  });
});
