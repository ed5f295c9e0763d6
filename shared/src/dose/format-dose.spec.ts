import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundTo } from './float-noise.js';
import { NOT_A_NUMBER_DISPLAY, formatDose } from './format-dose.js';

// ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations is the source of every
// display rule checked here, unless a test says otherwise.
describe('formatDose', () => {
  it('always writes a leading zero', () => {
    expect(formatDose(0.5, 'mg')).toBe('0.5 mg');
    expect(formatDose(0.05, 'mg')).toBe('0.05 mg');
  });

  it('never writes a trailing zero', () => {
    expect(formatDose(1, 'mg')).toBe('1 mg');
    expect(formatDose(1.0, 'mg')).toBe('1 mg');
    expect(formatDose(2.5, 'mL/h')).toBe('2.5 mL/h');
    expect(formatDose(10, 'mcg')).toBe('10 mcg');
  });

  it('groups thousands with commas from 1,000', () => {
    expect(formatDose(1000, 'mcg')).toBe('1,000 mcg');
    expect(formatDose(999, 'mcg')).toBe('999 mcg');
    expect(formatDose(1234567.891, 'mcg')).toBe('1,234,567.891 mcg');
  });

  it('writes mcg and mL, never µg, ug or cc', () => {
    expect(formatDose(100, 'ug')).toBe('100 mcg');
    expect(formatDose(100, '\u00b5g')).toBe('100 mcg');
    expect(formatDose(20, 'cc')).toBe('20 mL');
    expect(formatDose(20, 'ml')).toBe('20 mL');
    expect(formatDose(15, 'ug/kg')).toBe('15 mcg/kg');
  });

  it('shows at most 3 decimals, rounding half away from zero, without float noise', () => {
    expect(formatDose(0.1 + 0.2, 'mg')).toBe('0.3 mg');
    expect(formatDose(0.0125, 'mg')).toBe('0.013 mg');
    expect(formatDose(1.2345, 'mg')).toBe('1.235 mg');
    expect(formatDose(0.0004, 'mg')).toBe('0 mg');
    expect(formatDose(2 / 3, 'mL')).toBe('0.667 mL');
  });

  it('shows a negative amount with its sign and never "-0" (judgement: discrepancies are signed)', () => {
    expect(formatDose(-0.5, 'mL')).toBe('-0.5 mL');
    expect(formatDose(-1500, 'mL')).toBe('-1,500 mL');
    expect(formatDose(-0, 'mL')).toBe('0 mL');
    expect(formatDose(-0.0001, 'mL')).toBe('0 mL');
  });

  it('shows "—" with no unit for a value that is not a finite number', () => {
    expect(formatDose(Number.NaN, 'mg')).toBe(NOT_A_NUMBER_DISPLAY);
    expect(formatDose(Infinity, 'mg')).toBe('—');
    expect(formatDose(-Infinity, 'mg')).toBe('—');
  });

  it('prints the number alone for an empty unit', () => {
    expect(formatDose(6, '')).toBe('6');
  });

  it('property: no trailing zero after the point, no bare point, at most 3 decimals, round-trips', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e12, max: 1e12, noNaN: true }), (amount) => {
        const text = formatDose(amount, 'mg');
        const number = text.replace(/ mg$/, '');
        expect(number).toMatch(/^-?\d{1,3}(,\d{3})*(\.\d{0,2}[1-9])?$/);
        expect(number).not.toMatch(/(^|[^\d])\./); // never '.5' nor '-.5'
        const parsed = Number(number.replace(/,/g, ''));
        expect(parsed).toBe(roundTo(amount, 3));
        // Independently of roundTo: within half a thousandth (plus 12-significant-figure slack).
        expect(Math.abs(parsed - amount)).toBeLessThanOrEqual(0.0005 + Math.abs(amount) * 1e-11);
      }),
    );
  });
});
