import { describe, expect, it } from 'vitest';
import { normaliseUnit } from './normalise-unit.js';

// ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations: mcg, not µg; mL, not
// cc; "units", not U.
describe('normaliseUnit', () => {
  it('writes micrograms as mcg', () => {
    expect(normaliseUnit('ug')).toBe('mcg');
    expect(normaliseUnit('\u00b5g')).toBe('mcg');
    expect(normaliseUnit('\u03bcg')).toBe('mcg');
    expect(normaliseUnit('MCG')).toBe('mcg');
  });

  it('writes millilitres as mL', () => {
    expect(normaliseUnit('cc')).toBe('mL');
    expect(normaliseUnit('ml')).toBe('mL');
    expect(normaliseUnit('mL')).toBe('mL');
  });

  it('writes units in full', () => {
    expect(normaliseUnit('U')).toBe('units');
    expect(normaliseUnit('IU')).toBe('units');
  });

  it('normalises each part of a compound unit', () => {
    expect(normaliseUnit('ug/kg/h')).toBe('mcg/kg/h');
    expect(normaliseUnit('mg/ml')).toBe('mg/mL');
    expect(normaliseUnit('cc/hr')).toBe('mL/h');
    expect(normaliseUnit(' µg / mL ')).toBe('mcg/mL');
  });

  it('leaves unknown units and the empty unit alone', () => {
    expect(normaliseUnit('breaths/min')).toBe('breaths/min');
    expect(normaliseUnit('%')).toBe('%');
    expect(normaliseUnit('')).toBe('');
  });
});
