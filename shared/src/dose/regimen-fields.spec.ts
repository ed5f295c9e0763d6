import { describe, expect, it } from 'vitest';
import { DOSE_FIELDS, REGIMEN_FIELDS, regimenFieldUnit } from './regimen-fields.js';

// Field units follow docs/design.md, "Order fields and dosing conventions" (definition, no outside source).
describe('regimen fields', () => {
  it('treats every field but the lockout as an amount of drug', () => {
    expect(DOSE_FIELDS).toHaveLength(REGIMEN_FIELDS.length - 1);
    expect(DOSE_FIELDS).not.toContain('lockoutMinutes');
  });

  it('gives each field its display unit', () => {
    expect(regimenFieldUnit('demandDose', 'mg', false)).toBe('mg');
    expect(regimenFieldUnit('demandDose', 'mcg', true)).toBe('mcg/kg');
    expect(regimenFieldUnit('basalRatePerHour', 'mg', false)).toBe('mg/h');
    expect(regimenFieldUnit('basalRatePerHour', 'mcg', true)).toBe('mcg/kg/h');
    expect(regimenFieldUnit('lockoutMinutes', 'mg', true)).toBe('min');
  });
});
