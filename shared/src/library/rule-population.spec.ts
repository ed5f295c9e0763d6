import { describe, expect, it } from 'vitest';
import { populationContains, populationKey, populationLabel, populationProblems, type RuleForPopulationCheck } from './rule-population.js';

// Demo values (invented). The adult boundary of 18 years is common practice (patients/adult-age.ts).
const adultMorphine: RuleForPopulationCheck = {
  drugId: 1,
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: false,
  limits: { demandDose: { softMax: 2, hardMax: 3 }, fourHourLimit: { hardMax: 40 } },
};
const childMorphine: RuleForPopulationCheck = {
  drugId: 1,
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: true,
  population: 'paediatric',
  minAgeYears: 1,
  maxAgeYears: 18,
  minWeightKg: 10,
  limits: {
    demandDose: { softMax: 0.02, hardMax: 0.03, ceiling: 1.5 },
    lockoutMinutes: { hardMin: 5 },
    fourHourLimit: { hardMax: 0.4, ceiling: 20 },
  },
};

describe('populations', () => {
  it('keys, labels and matches bands (minimum inclusive, maximum exclusive, blank open)', () => {
    expect(populationKey(adultMorphine)).toBe('adult');
    expect(populationKey(childMorphine)).toBe('paediatric:1-18:10-');
    expect(populationLabel(childMorphine)).toBe('Paediatric, 1 to under 18 years, 10 kg and over');
    expect(populationLabel({ population: 'paediatric' })).toBe('Paediatric, any age or weight');
    expect(populationContains(childMorphine, { ageMonths: 12, weightKg: 10 })).toBe(true);
    expect(populationContains(childMorphine, { ageMonths: 11, weightKg: 10 })).toBe(false);
    expect(populationContains(childMorphine, { ageMonths: 120, weightKg: 9.9 })).toBe(false);
    expect(populationContains(childMorphine, { ageYears: 18, weightKg: 60 })).toBe(false);
    expect(populationContains(adultMorphine, { ageYears: 18 })).toBe(true);
    expect(populationContains(adultMorphine, { ageYears: 17 })).toBe(false);
  });
});

describe('populationProblems', () => {
  it('accepts an adult rule and a per-kg paediatric rule with ceilings under the adult maximum', () => {
    expect(populationProblems([adultMorphine, childMorphine])).toEqual([]);
  });

  it('refuses a per-kg dose limit without an absolute ceiling, naming the field', () => {
    const noCeiling = { ...childMorphine, limits: { ...childMorphine.limits, basalRatePerHour: { hardMax: 0.01 } } };
    expect(populationProblems([noCeiling])).toEqual([
      {
        path: 'rules.0.limits.basalRatePerHour.ceiling',
        message: 'Basal rate: a per-kg rule needs an absolute ceiling in mg, whatever the weight',
      },
    ]);
  });

  it('refuses a ceiling above the adult rule, in this version or another active library', () => {
    const high = { ...childMorphine, limits: { ...childMorphine.limits, demandDose: { hardMax: 0.03, ceiling: 4 } } };
    expect(populationProblems([adultMorphine, high])).toEqual([
      {
        path: 'rules.1.limits.demandDose.ceiling',
        message: 'Demand dose: the ceiling 4 mg is above the adult hard maximum 3 mg (this version)',
      },
    ]);
    expect(populationProblems([high], [{ ...adultMorphine, wardName: 'Cedar' }])[0].message).toBe(
      "Demand dose: the ceiling 4 mg is above the adult hard maximum 3 mg (Cedar's active library)",
    );
  });

  it('refuses a ceiling on a rule that is not per kg, a zero ceiling, and a ceiling on the lockout', () => {
    const paths = (rule: RuleForPopulationCheck) => populationProblems([rule]).map((p) => p.path);
    expect(paths({ ...adultMorphine, limits: { demandDose: { hardMax: 3, ceiling: 3 } } })).toEqual(['rules.0.limits.demandDose.ceiling']);
    expect(paths({ ...childMorphine, limits: { demandDose: { hardMax: 0.03, ceiling: 0 } } })).toEqual([
      'rules.0.limits.demandDose.ceiling',
    ]);
    expect(paths({ ...childMorphine, limits: { lockoutMinutes: { hardMin: 5, ceiling: 10 } } })).toEqual([
      'rules.0.limits.lockoutMinutes.ceiling',
    ]);
  });

  it('refuses bands on adult rules, bounds out of range or reversed, and overlapping paediatric bands', () => {
    expect(populationProblems([{ ...adultMorphine, minAgeYears: 16 }]).map((p) => p.path)).toEqual(['rules.0.minAgeYears']);
    expect(populationProblems([{ ...childMorphine, maxAgeYears: 21 }]).map((p) => p.path)).toEqual(['rules.0.maxAgeYears']);
    expect(populationProblems([{ ...childMorphine, minAgeYears: 12, maxAgeYears: 5 }]).map((p) => p.path)).toEqual(['rules.0.maxAgeYears']);
    expect(populationProblems([{ ...childMorphine, maxWeightKg: 5 }]).map((p) => p.path)).toEqual(['rules.0.maxWeightKg']);
    const younger = { ...childMorphine, minAgeYears: 1, maxAgeYears: 12 };
    const older = { ...childMorphine, minAgeYears: 12, maxAgeYears: 18 };
    expect(populationProblems([younger, older])).toEqual([]);
    const overlapping = { ...childMorphine, minAgeYears: 10, maxAgeYears: 18 };
    expect(populationProblems([younger, overlapping])).toEqual([
      {
        path: 'rules.1.minAgeYears',
        message:
          "Rule 2's band (Paediatric, 10 to under 18 years, 10 kg and over) overlaps rule 1's (Paediatric, 1 to under 12 years, 10 kg and over): a child would match both",
      },
    ]);
  });
});
