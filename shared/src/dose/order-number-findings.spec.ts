import { describe, expect, it } from 'vitest';
import { invalidNumberFindings, isUsableNumber } from './order-number-findings.js';
import type { Regimen } from './types.js';

// A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: morphine 1 mg demand, lockout 10 minutes;
// morphine 1 mg/mL [practice; ASHP Standardize 4 Safety].
const ashpMorphine: Regimen = {
  doseUnit: 'mg',
  concentrationPerMl: 1,
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
};

describe('invalidNumberFindings', () => {
  it('finds nothing wrong with a starting regimen', () => {
    expect(invalidNumberFindings(ashpMorphine)).toEqual([]);
    expect(invalidNumberFindings({ ...ashpMorphine, loadingDose: null, oneHourLimit: undefined })).toEqual([]);
  });

  it('flags NaN, Infinity and negative numbers on their own field', () => {
    const findings = invalidNumberFindings({
      ...ashpMorphine,
      demandDose: Number.NaN,
      basalRatePerHour: -1,
      fourHourLimit: Infinity,
    });
    expect(findings).toEqual([
      { field: 'demandDose', severity: 'error', code: 'number.not-finite', message: 'Demand dose must be a number' },
      { field: 'basalRatePerHour', severity: 'error', code: 'number.negative', message: 'Basal rate cannot be negative' },
      { field: 'fourHourLimit', severity: 'error', code: 'number.not-finite', message: '4-hour limit must be a number' },
    ]);
  });

  it('requires a concentration above 0', () => {
    expect(invalidNumberFindings({ ...ashpMorphine, concentrationPerMl: 0 })).toEqual([
      {
        field: 'concentrationPerMl',
        severity: 'error',
        code: 'concentration.not-positive',
        message: 'Concentration must be more than 0',
      },
    ]);
    expect(invalidNumberFindings({ ...ashpMorphine, concentrationPerMl: -1 })[0].code).toBe('number.negative');
  });

  it('flags a required number that is missing or not a number at all', () => {
    const fromForm = { ...ashpMorphine, lockoutMinutes: undefined, demandDose: '1' } as unknown as Regimen;
    expect(invalidNumberFindings(fromForm).map((f) => [f.field, f.code])).toEqual([
      ['demandDose', 'number.not-finite'],
      ['lockoutMinutes', 'number.missing'],
    ]);
  });
});

describe('isUsableNumber', () => {
  it('accepts finite numbers of 0 and above only', () => {
    expect(isUsableNumber(0)).toBe(true);
    expect(isUsableNumber(0.2)).toBe(true);
    expect(isUsableNumber(-0.2)).toBe(false);
    expect(isUsableNumber(Number.NaN)).toBe(false);
    expect(isUsableNumber(null)).toBe(false);
    expect(isUsableNumber(undefined)).toBe(false);
  });
});
