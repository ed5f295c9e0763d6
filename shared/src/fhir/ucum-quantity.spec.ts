import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { concentrationRatio, doseQuantity, dosePerHours, hourlyRateQuantity, minutesDuration, ucumQuantity } from './ucum-quantity.js';

// The typed slice of @lhncbc/ucum-lhc used here (see dose/units.spec.ts for why it is required).
type UcumUtils = { validateUnitString(unit: string): { status: string; ucumCode: string | null } };
const require = createRequire(import.meta.url);
const ucum = (require('@lhncbc/ucum-lhc') as { UcumLhcUtils: { getInstance(): UcumUtils } }).UcumLhcUtils.getInstance();

// Source: UCUM, via the npm package @lhncbc/ucum-lhc [lib];
// FHIR R4 Quantity (datatypes.html): `unit` for display, `system` + `code` for the coded unit.
describe('UCUM quantities', () => {
  it('keeps Lockstep’s display unit and sends the UCUM code', () => {
    expect(doseQuantity(10, 'mcg')).toEqual({ value: 10, unit: 'mcg', system: 'http://unitsofmeasure.org', code: 'ug' });
    expect(doseQuantity(1, 'mg')).toEqual({ value: 1, unit: 'mg', system: 'http://unitsofmeasure.org', code: 'mg' });
    expect(hourlyRateQuantity(20, 'mcg')).toMatchObject({ unit: 'mcg/h', code: 'ug/h' });
    expect(minutesDuration(10)).toMatchObject({ value: 10, unit: 'min', code: 'min' });
  });

  it('builds ratios of dose per time and dose per mL', () => {
    expect(dosePerHours(30, 'mg', 4)).toEqual({ numerator: doseQuantity(30, 'mg'), denominator: ucumQuantity(4, 'h') });
    expect(concentrationRatio(10, 'mcg')).toEqual({ numerator: doseQuantity(10, 'mcg'), denominator: ucumQuantity(1, 'mL') });
  });

  it('uses only codes UCUM accepts as written', () => {
    const codes = [
      doseQuantity(1, 'mg'),
      doseQuantity(1, 'mcg'),
      hourlyRateQuantity(1, 'mg'),
      hourlyRateQuantity(1, 'mcg'),
      ucumQuantity(1, 'mL'),
      ucumQuantity(1, 'h'),
      minutesDuration(1),
    ].map((quantity) => quantity.code);
    expect(codes).toEqual(['mg', 'ug', 'mg/h', 'ug/h', 'mL', 'h', 'min']);
    for (const code of codes) expect(ucum.validateUnitString(code), code).toMatchObject({ status: 'valid', ucumCode: code });
  });
});
