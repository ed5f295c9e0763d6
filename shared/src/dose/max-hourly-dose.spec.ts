import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { withoutFloatNoise } from './float-noise.js';
import { maxHourlyDose } from './max-hourly-dose.js';
import { possibleTotals } from './possible-totals.js';
import type { Regimen } from './types.js';

function regimen(overrides: Partial<Regimen>): Regimen {
  return { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 1, lockoutMinutes: 10, basalRatePerHour: 0, ...overrides };
}

// Amounts as a person types them: up to 3 decimals.
const typedAmount = fc.integer({ min: 0, max: 1_000_000 }).map((n) => n / 1000);
const anyAmount = fc.double({ min: 0, max: 1e6, noNaN: true });
const lockout = fc.double({ min: 1, max: 240, noNaN: true });

describe('maxHourlyDose', () => {
  it('gives 6 mg an hour for morphine 1 mg demand with a 10-minute lockout', () => {
    // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: morphine 1 mg demand, lockout 10 minutes;
    // 1 mg × ceil(60 ÷ 10) is the definition.
    expect(maxHourlyDose(regimen({}))).toBe(6);
  });

  it('gives the hourly maximum of the other common starting regimens', () => {
    // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: hydromorphone 0.2 mg, fentanyl 10 mcg.
    expect(maxHourlyDose(regimen({ demandDose: 0.2, concentrationPerMl: 0.2 }))).toBe(1.2);
    expect(maxHourlyDose(regimen({ doseUnit: 'mcg', demandDose: 10, concentrationPerMl: 10 }))).toBe(60);
  });

  it('adds the basal rate and caps at the 1-hour limit (definition)', () => {
    expect(maxHourlyDose(regimen({ basalRatePerHour: 0.5 }))).toBe(6.5);
    expect(maxHourlyDose(regimen({ basalRatePerHour: 0.5, oneHourLimit: 5 }))).toBe(5);
    expect(maxHourlyDose(regimen({ oneHourLimit: 8 }))).toBe(6);
    expect(maxHourlyDose(regimen({ oneHourLimit: null }))).toBe(6);
  });

  it('adds the loading dose and one clinician bolus, and is held by the 4-hour limit too (definition, docs/design.md)', () => {
    // Written wrong before: the loading dose and clinician bolus were left out of the most per hour.
    expect(maxHourlyDose(regimen({ loadingDose: 2, clinicianBolusDose: 2 }))).toBe(10);
    expect(maxHourlyDose(regimen({ clinicianBolusDose: 2 }))).toBe(8);
    expect(maxHourlyDose(regimen({ clinicianBolusDose: 2 }), { clinicianBolusesPerFourHours: 2 })).toBe(10);
    expect(maxHourlyDose(regimen({ demandDose: 2, lockoutMinutes: 6, fourHourLimit: 12 }))).toBe(12);
  });

  it('handles a zero demand dose and a missing lockout without NaN', () => {
    expect(maxHourlyDose(regimen({ demandDose: 0, basalRatePerHour: 2, lockoutMinutes: 0 }))).toBe(2);
    expect(maxHourlyDose(regimen({ lockoutMinutes: 0 }))).toBe(Infinity);
    expect(maxHourlyDose(regimen({ lockoutMinutes: 0, oneHourLimit: 10 }))).toBe(10);
  });

  it('property: the capped maximum never exceeds the 1-hour limit', () => {
    fc.assert(
      fc.property(anyAmount, anyAmount, lockout, anyAmount, (demandDose, basal, lockoutMinutes, limit) => {
        const r = regimen({ demandDose, basalRatePerHour: basal, lockoutMinutes, oneHourLimit: limit });
        expect(maxHourlyDose(r)).toBeLessThanOrEqual(limit);
      }),
    );
  });

  it('property: the maximum is at least the basal rate unless a 1-hour limit below it caps it', () => {
    fc.assert(
      fc.property(typedAmount, typedAmount, lockout, (demandDose, basal, lockoutMinutes) => {
        const r = regimen({ demandDose, basalRatePerHour: basal, lockoutMinutes });
        expect(maxHourlyDose(r)).toBeGreaterThanOrEqual(basal);
        expect(maxHourlyDose({ ...r, oneHourLimit: basal + demandDose })).toBeGreaterThanOrEqual(basal);
      }),
    );
    // For any double, exact to the 12 significant figures the engine keeps.
    fc.assert(
      fc.property(anyAmount, anyAmount, lockout, (demandDose, basal, lockoutMinutes) => {
        const r = regimen({ demandDose, basalRatePerHour: basal, lockoutMinutes });
        expect(maxHourlyDose(r)).toBeGreaterThanOrEqual(withoutFloatNoise(basal));
      }),
    );
  });
});

describe('the uncapped window figure', () => {
  it('counts basal per hour of the window (definition)', () => {
    expect(possibleTotals(regimen({ demandDose: 0, basalRatePerHour: 1.5 })).anyFourHours.uncapped).toBe(6);
  });
});
