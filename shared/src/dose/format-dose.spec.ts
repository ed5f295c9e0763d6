import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundTo } from './float-noise.js';
import { NOT_A_NUMBER_DISPLAY, formatDose, formatLimit } from './format-dose.js';

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

  it('shows at most 3 decimals from 1 up, rounding half away from zero, without float noise', () => {
    expect(formatDose(0.1 + 0.2, 'mg')).toBe('0.3 mg');
    expect(formatDose(1.2345, 'mg')).toBe('1.235 mg');
    expect(formatDose(2 / 3, 'mL')).toBe('0.667 mL');
  });

  it('never shows an amount that is not 0 as 0: below 1 mg it switches to mcg when mg would lose digits', () => {
    // ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations: use mcg for
    // amounts below 1 mg. Written wrong before: 0.0004 mg was shown as '0 mg' and 0.0125 mg as
    // '0.013 mg'.
    expect(formatDose(0.0004, 'mg')).toBe('0.4 mcg');
    expect(formatDose(0.0125, 'mg')).toBe('12.5 mcg');
    expect(formatDose(0.0143, 'mg/kg')).toBe('14.3 mcg/kg');
    expect(formatDose(0.00025, 'mg/kg/h')).toBe('0.25 mcg/kg/h');
    expect(formatDose(-0.0004, 'mg')).toBe('-0.4 mcg');
    expect(formatDose(2 / 3000, 'mg')).toBe('0.667 mcg');
  });

  it("keeps the order's own unit where 3 decimals show the amount exactly (the pump is programmed in it)", () => {
    expect(formatDose(0.05, 'mg')).toBe('0.05 mg');
    expect(formatDose(0.016, 'mg/kg')).toBe('0.016 mg/kg');
    expect(formatDose(0.999, 'mg')).toBe('0.999 mg');
  });

  it('keeps 3 significant figures of a tiny amount in any other unit, never 0', () => {
    expect(formatDose(0.000123456, 'mcg')).toBe('0.000123 mcg');
    expect(formatDose(0.0004, 'mcg')).toBe('0.0004 mcg');
    expect(formatDose(0.0000004, 'mg')).toBe('0.0004 mcg');
    expect(formatDose(5e-324, 'mcg')).toMatch(/^< 0\.0+1 mcg$/);
  });

  it('shows a negative amount with its sign and never "-0" (judgement: discrepancies are signed)', () => {
    expect(formatDose(-0.5, 'mL')).toBe('-0.5 mL');
    expect(formatDose(-1500, 'mL')).toBe('-1,500 mL');
    expect(formatDose(-0, 'mL')).toBe('0 mL');
    // Written wrong before ('0 mL'): an amount that is not 0 is never shown as 0.
    expect(formatDose(-0.0001, 'mL')).toBe('-0.0001 mL');
  });

  it('shows "—" with no unit for a value that is not a finite number', () => {
    expect(formatDose(Number.NaN, 'mg')).toBe(NOT_A_NUMBER_DISPLAY);
    expect(formatDose(Infinity, 'mg')).toBe('—');
    expect(formatDose(-Infinity, 'mg')).toBe('—');
  });

  it('prints the number alone for an empty unit', () => {
    expect(formatDose(6, '')).toBe('6');
  });

  it('property: safe spelling; never 0 for an amount that is not 0; reads back within its shown precision', () => {
    fc.assert(
      // Float dust below 1e-15 has its own example below.
      fc.property(
        fc.double({ min: -1e12, max: 1e12, noNaN: true }).filter((x) => x === 0 || Math.abs(x) >= 1e-15),
        (amount) => {
          const text = formatDose(amount, 'mg');
          const [number, unit] = text.split(' ');
          expect(number).toMatch(/^-?\d{1,3}(,\d{3})*(\.\d*[1-9])?$/);
          expect(number).not.toMatch(/(^|[^\d])\./); // never '.5' nor '-.5'
          const parsed = Number(number.replace(/,/g, ''));
          if (amount !== 0) expect(parsed).not.toBe(0);
          const inMg = unit === 'mcg' ? parsed / 1000 : parsed;
          expect(unit === 'mg' || Math.abs(amount) < 1).toBe(true);
          if (unit === 'mg') {
            // From 1 mg, or exact at 3 decimals: within half a thousandth (plus 12-significant-figure slack).
            expect(parsed).toBe(roundTo(amount, 3));
            expect(Math.abs(parsed - amount)).toBeLessThanOrEqual(0.0005 + Math.abs(amount) * 1e-11);
          } else {
            // In mcg: within half a thousandth of a mcg, or 3 significant figures of a tinier amount.
            expect(Math.abs(inMg - amount)).toBeLessThanOrEqual(Math.max(0.0005e-3, Math.abs(amount) * 0.005) + 1e-15);
          }
        },
      ),
    );
  });
});

describe('formatLimit', () => {
  it('shows a limit to its full stored precision, never rounded, in the safe spelling', () => {
    // ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations: leading zero, no
    // trailing zero, mcg. Rounding a limit to 3 decimals would show 0.0125 mg/kg as 0.013.
    expect(formatLimit(0.0125, 'mg/kg')).toBe('0.0125 mg/kg');
    expect(formatLimit(15, 'mg')).toBe('15 mg');
    expect(formatLimit(1234.5678, 'ug')).toBe('1,234.5678 mcg');
    expect(formatLimit(0.5, 'mL')).toBe('0.5 mL');
  });

  it('writes plain decimals, never an exponent', () => {
    expect(formatLimit(1e-7, 'mg')).toBe('0.0000001 mg');
    expect(formatLimit(1.5e21, 'mcg')).toBe('1,500,000,000,000,000,000,000 mcg');
    expect(formatLimit(1.25e-10, 'mg')).toBe('0.000000000125 mg');
    expect(formatLimit(Infinity, 'mg')).toBe(NOT_A_NUMBER_DISPLAY);
  });

  it('property: reads back as the same stored number', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e25, noNaN: true }), (limit) => {
        const text = formatLimit(limit, '');
        expect(text).not.toMatch(/e/i);
        expect(Number(text.replace(/,/g, ''))).toBe(limit);
      }),
    );
  });
});
