import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { maxFourHourDose } from './max-four-hour-dose.js';
import type { Regimen } from './types.js';

function regimen(overrides: Partial<Regimen>): Regimen {
  return { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 1, lockoutMinutes: 10, basalRatePerHour: 0, ...overrides };
}

describe('maxFourHourDose', () => {
  it('morphine: 1 mg every 10 minutes under a 30 mg 4-hour limit', () => {
    // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: morphine 1 mg demand, lockout 10 minutes.
    // Morphine 4-hour limit 30 mg: common practice (docs/clinical-sources.md, "Typical ranges").
    expect(maxFourHourDose(regimen({ fourHourLimit: 30 }))).toBe(24); // 1 × ceil(240 ÷ 10)
    // Same table, demand 2 mg and lockout 5 min: 96 mg uncapped, so the 30 mg limit binds.
    expect(maxFourHourDose(regimen({ demandDose: 2, lockoutMinutes: 5 }))).toBe(96);
    expect(maxFourHourDose(regimen({ demandDose: 2, lockoutMinutes: 5, fourHourLimit: 30 }))).toBe(30);
  });

  it('hydromorphone: 0.2–0.4 mg every 10 minutes under a 6 mg 4-hour limit', () => {
    // Hydromorphone demand 0.1–0.4 mg, lockout 10 min, 4-hour limit 6 mg: common practice
    // (docs/clinical-sources.md, "Typical ranges").
    expect(maxFourHourDose(regimen({ demandDose: 0.2, fourHourLimit: 6 }))).toBe(4.8);
    expect(maxFourHourDose(regimen({ demandDose: 0.4, fourHourLimit: 6 }))).toBe(6);
  });

  it('fentanyl: 5–20 mcg every 4–10 minutes under a 300 mcg 4-hour limit', () => {
    // Fentanyl demand 5–20 mcg, lockout 4–10 min, 4-hour limit 300 mcg: common practice
    // (docs/clinical-sources.md, "Typical ranges").
    const fentanyl = { doseUnit: 'mcg' as const, concentrationPerMl: 10, fourHourLimit: 300 };
    expect(maxFourHourDose(regimen({ ...fentanyl, demandDose: 10 }))).toBe(240);
    expect(maxFourHourDose(regimen({ ...fentanyl, demandDose: 20, lockoutMinutes: 4 }))).toBe(300);
  });

  it('adds four hours of basal (definition)', () => {
    expect(maxFourHourDose(regimen({ basalRatePerHour: 0.5 }))).toBe(26);
    expect(maxFourHourDose(regimen({ demandDose: 0, basalRatePerHour: 0.1 }))).toBe(0.4);
  });

  it('adds the loading dose and one clinician bolus, and is held by 4 × the 1-hour limit (definition, docs/design.md)', () => {
    // Written wrong before: the loading dose and clinician bolus were left out of the most in 4 hours.
    expect(maxFourHourDose(regimen({ loadingDose: 2, clinicianBolusDose: 2 }))).toBe(28);
    expect(maxFourHourDose(regimen({ demandDose: 2, lockoutMinutes: 5, oneHourLimit: 5 }))).toBe(20);
  });

  it('property: the capped maximum never exceeds the 4-hour limit', () => {
    const amount = fc.double({ min: 0, max: 1e6, noNaN: true });
    fc.assert(
      fc.property(amount, amount, fc.double({ min: 1, max: 240, noNaN: true }), amount, (d, b, l, limit) => {
        const r = regimen({ demandDose: d, basalRatePerHour: b, lockoutMinutes: l, fourHourLimit: limit });
        expect(maxFourHourDose(r)).toBeLessThanOrEqual(limit);
      }),
    );
  });
});
