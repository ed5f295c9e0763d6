import { describe, expect, it } from 'vitest';
import { OLDER_PATIENT_AGE_YEARS, patientCautions } from './patient-cautions.js';
import type { PatientFactors, Regimen } from './types.js';

const demandOnly: Regimen = { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 1, lockoutMinutes: 10, basalRatePerHour: 0 };
const withBasal: Regimen = { ...demandOnly, basalRatePerHour: 0.5 };
const naive: PatientFactors = { opioidTolerant: false, ageYears: 45 };
const fields = (r: Regimen, p: PatientFactors) => patientCautions(r, p).map((f) => [f.field, f.severity, f.code]);

describe('patientCautions', () => {
  it('raises nothing for a demand-only order in a low-risk patient', () => {
    expect(patientCautions(demandOnly, naive)).toEqual([]);
  });

  it('needs a reason for a basal rate in an opioid-naive adult', () => {
    // Chou R et al., Management of Postoperative Pain: a clinical practice guideline from the
    // American Pain Society, ASRA and ASA, J Pain 2016;17(2):131-157: no routine basal infusion in
    // opioid-naive adults (strong recommendation). Written wrong before: a caution needing no reason.
    expect(fields(withBasal, naive)).toEqual([['basalRatePerHour', 'soft', 'risk.basal-opioid-naive']]);
    expect(fields(withBasal, { ...naive, ageYears: null })).toEqual([['basalRatePerHour', 'soft', 'risk.basal-opioid-naive']]);
    expect(patientCautions(withBasal, { ...naive, opioidTolerant: true })).toEqual([]);
    expect(patientCautions(withBasal, naive)[0].message).toMatch(/not recommended in opioid-naive adults/);
  });

  it('only cautions about a basal rate in an opioid-naive child (the guideline is for adults)', () => {
    // Chou et al. 2016 write for adults; 18 as the adult boundary is common practice.
    expect(fields(withBasal, { ...naive, ageYears: 7 })).toEqual([['basalRatePerHour', 'caution', 'caution.basal-opioid-naive']]);
  });

  it('cautions from age 65, replacing the caution from 70', () => {
    // The Joint Commission, Sentinel Event Alert 49 (2012), citing Cepeda et al. 2003: respiratory
    // depression risk 2.8 times in ages 61–70. 65 as the threshold is common practice.
    expect(OLDER_PATIENT_AGE_YEARS).toBe(65);
    expect(fields(demandOnly, { opioidTolerant: true, ageYears: 65 })).toEqual([['patient', 'caution', 'caution.age-65-or-over']]);
    expect(patientCautions(demandOnly, { opioidTolerant: true, ageYears: 64 })).toEqual([]);
    expect(patientCautions(demandOnly, { ...naive, ageYears: null })).toEqual([]);
  });

  it('cautions for sleep apnoea and other sedatives on the patient', () => {
    // The Joint Commission, Sentinel Event Alert 49 (2012) lists both as risk factors [memory for the wording].
    expect(fields(demandOnly, { opioidTolerant: true, sleepApnoea: true, ageYears: 40, otherSedatives: true })).toEqual([
      ['patient', 'caution', 'caution.sleep-apnoea'],
      ['patient', 'caution', 'caution.other-sedatives'],
    ]);
  });

  it('needs a reason when risk factors combine: naive + sleep apnoea + other sedatives, or age 65+ with a basal rate', () => {
    // Factors: The Joint Commission, Sentinel Event Alert 49 (2012). A reason for the combination: common practice.
    expect(fields(demandOnly, { ...naive, sleepApnoea: true, otherSedatives: true })).toEqual([
      ['demandDose', 'soft', 'risk.naive-apnoea-sedatives'],
      ['patient', 'caution', 'caution.sleep-apnoea'],
      ['patient', 'caution', 'caution.other-sedatives'],
    ]);
    expect(fields(withBasal, { opioidTolerant: true, ageYears: 72 })).toEqual([
      ['basalRatePerHour', 'soft', 'risk.older-with-basal'],
      ['patient', 'caution', 'caution.age-65-or-over'],
    ]);
    // Two of the three are cautions only.
    expect(fields(demandOnly, { ...naive, sleepApnoea: true })).toEqual([['patient', 'caution', 'caution.sleep-apnoea']]);
  });
});
