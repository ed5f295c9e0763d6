import { describe, expect, it } from 'vitest';
import { concentrationProblem, limitValueProblem, MAX_DOSE_LIMIT, MAX_LOCKOUT_MINUTES, plainDecimal } from './limit-bounds.js';

// The bounds are Lockstep's own input sanity bounds (docs/library-csv.md), not clinical values.
describe('limit bounds', () => {
  it('accepts finite limits from 0 to the bound of the field', () => {
    expect(limitValueProblem('demandDose', 0)).toBeNull();
    expect(limitValueProblem('demandDose', 0.0000001)).toBeNull();
    expect(limitValueProblem('fourHourLimit', MAX_DOSE_LIMIT)).toBeNull();
    expect(limitValueProblem('lockoutMinutes', MAX_LOCKOUT_MINUTES)).toBeNull();
  });

  it('refuses infinite, NaN, negative and out-of-range limits, naming the field', () => {
    expect(limitValueProblem('demandDose', Infinity)).toBe('Demand dose: a limit must be a finite number');
    expect(limitValueProblem('demandDose', Number.NaN)).toBe('Demand dose: a limit must be a finite number');
    expect(limitValueProblem('demandDose', -1)).toBe('Demand dose: a limit must be 0 or more');
    expect(limitValueProblem('lockoutMinutes', 1441, 'lockout_minutes')).toBe(
      'lockout_minutes: a limit is at most 1440 minutes; this is 1441',
    );
    expect(limitValueProblem('oneHourLimit', 1e21)).toBe(
      '1-hour limit: a limit is at most 10000 (in the dose unit); this is 1000000000000000000000',
    );
    expect(concentrationProblem(0)).toBe('Concentration must be a number more than 0');
    expect(concentrationProblem(Infinity)).toBe('Concentration must be a number more than 0');
    expect(concentrationProblem(20_000)).toBe('Concentration is at most 10000 per mL; this is 20000');
  });

  it('writes numbers as plain decimals without an exponent, reading back to the same number', () => {
    expect(plainDecimal(0.0000001)).toBe('0.0000001');
    expect(plainDecimal(1.25e-7)).toBe('0.000000125');
    expect(plainDecimal(1000000000)).toBe('1000000000');
    expect(plainDecimal(1e21)).toBe('1000000000000000000000');
    expect(plainDecimal(1.5e22)).toBe('15000000000000000000000');
    expect(plainDecimal(-2.5e-8)).toBe('-0.000000025');
    expect(plainDecimal(0.1 + 0.2)).toBe('0.30000000000000004');
    for (const value of [1e-7, 1.25e-7, 5e-324, 1e9, 1e21, 123456789.123, 0.1 + 0.2, 2 / 3, Number.MAX_VALUE]) {
      expect(plainDecimal(value)).not.toMatch(/e/i);
      expect(Number(plainDecimal(value))).toBe(value);
    }
    expect(() => plainDecimal(Infinity)).toThrow(RangeError);
  });
});
