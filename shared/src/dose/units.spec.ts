import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { MCG_PER_MG, MINUTES_PER_HOUR, MS_PER_HOUR, UCUM_CODES, convertDoseUnit } from './units.js';

// The typed slice of @lhncbc/ucum-lhc these checks use. The package ships no types; loading it
// with require inside this spec keeps any declaration for it out of the published build.
type UcumValidation = { status: 'valid' | 'invalid' | 'error'; ucumCode: string | null; msg: string[] };
type UcumConversion = { status: 'succeeded' | 'failed' | 'error'; toVal: number | null; msg: string[] };
type UcumUtils = {
  validateUnitString(unit: string): UcumValidation;
  convertUnitTo(from: string, value: number, to: string): UcumConversion;
};
type UcumPackage = { UcumLhcUtils: { getInstance(): UcumUtils } };

const require = createRequire(import.meta.url);
const ucum = (require('@lhncbc/ucum-lhc') as UcumPackage).UcumLhcUtils.getInstance();

function ucumConvert(from: string, value: number, to: string): number {
  const result = ucum.convertUnitTo(from, value, to);
  expect(result.status).toBe('succeeded');
  return result.toVal ?? Number.NaN;
}

// Source for every check below: UCUM, via the npm package @lhncbc/ucum-lhc [lib]. UCUM results are
// floats, so they are compared with a tolerance.
describe('unit factors against UCUM', () => {
  it('1 mg is 1000 mcg (UCUM code ug)', () => {
    expect(ucumConvert('mg', 1, 'ug')).toBeCloseTo(MCG_PER_MG, 9);
    expect(convertDoseUnit(1, 'mg', 'mcg')).toBeCloseTo(ucumConvert('mg', 1, 'ug'), 9);
    expect(convertDoseUnit(250, 'mcg', 'mg')).toBeCloseTo(ucumConvert('ug', 250, 'mg'), 9);
  });

  it('1 h is 60 min and 3,600,000 ms', () => {
    expect(ucumConvert('h', 1, 'min')).toBeCloseTo(MINUTES_PER_HOUR, 9);
    expect(ucumConvert('h', 1, 'ms')).toBeCloseTo(MS_PER_HOUR, 3);
  });

  it('rates and concentrations convert by the same factor', () => {
    expect(ucumConvert('mg/h', 1, 'ug/h')).toBeCloseTo(MCG_PER_MG, 9);
    expect(ucumConvert('mg/mL', 1, 'ug/mL')).toBeCloseTo(MCG_PER_MG, 9);
  });

  it('does not convert a mass into a volume (dose → volume needs a concentration)', () => {
    expect(ucum.convertUnitTo('mg', 1, 'mL').status).toBe('failed');
  });

  it('every UCUM code the engine uses is valid UCUM', () => {
    const required = ['mg', 'ug', 'mL', 'mg/mL', 'ug/mL', 'mg/h', 'ug/h', 'min', 'h', 'ug/kg/h'];
    const used: string[] = Object.values(UCUM_CODES);
    for (const code of required) expect(used).toContain(code);
    for (const code of used) {
      const result = ucum.validateUnitString(code);
      expect(result.status, code).toBe('valid');
      expect(result.ucumCode, code).toBe(code);
    }
  });

  it('the display-only spellings "mcg" and "cc" are not UCUM codes', () => {
    expect(ucum.validateUnitString('mcg').status).toBe('invalid');
    expect(ucum.validateUnitString('cc').status).toBe('invalid');
    expect(UCUM_CODES.mcg).toBe('ug');
  });
});

// Definition (metric prefixes): these need no outside check beyond the above.
describe('convertDoseUnit', () => {
  it('leaves a same-unit amount alone', () => {
    expect(convertDoseUnit(0.2, 'mg', 'mg')).toBe(0.2);
    expect(convertDoseUnit(10, 'mcg', 'mcg')).toBe(10);
  });
});
