import { describe, expect, it } from 'vitest';
import { patientCautions } from './patient-cautions.js';
import type { PatientFactors, Regimen } from './types.js';

const demandOnly: Regimen = { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 1, lockoutMinutes: 10, basalRatePerHour: 0 };
const naive: PatientFactors = { opioidTolerant: false, ageYears: 45 };

describe('patientCautions', () => {
  it('raises nothing for a demand-only order in a low-risk patient', () => {
    expect(patientCautions(demandOnly, naive)).toEqual([]);
  });

  it('cautions against a basal rate in an opioid-naive patient only', () => {
    // ASHP Standardize 4 Safety, PCA standards (2023): basal rate only for opioid-tolerant patients.
    const withBasal = { ...demandOnly, basalRatePerHour: 0.5 };
    expect(patientCautions(withBasal, naive).map((f) => [f.field, f.code])).toEqual([['basalRatePerHour', 'caution.basal-opioid-naive']]);
    expect(patientCautions(withBasal, { ...naive, opioidTolerant: true })).toEqual([]);
  });

  it('cautions for sleep apnoea, age 70 or over and other sedatives on the patient', () => {
    // Risk factors listed in docs/design.md, "Order fields and dosing conventions" [practice].
    const findings = patientCautions(demandOnly, { opioidTolerant: true, sleepApnoea: true, ageYears: 70, otherSedatives: true });
    expect(findings.map((f) => [f.field, f.severity, f.code])).toEqual([
      ['patient', 'caution', 'caution.sleep-apnoea'],
      ['patient', 'caution', 'caution.age-70-or-over'],
      ['patient', 'caution', 'caution.other-sedatives'],
    ]);
    expect(patientCautions(demandOnly, { ...naive, ageYears: 69 })).toEqual([]);
    expect(patientCautions(demandOnly, { ...naive, ageYears: null })).toEqual([]);
  });
});
