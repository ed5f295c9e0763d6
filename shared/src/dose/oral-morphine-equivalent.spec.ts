import { describe, expect, it } from 'vitest';
import { type EquianalgesicDrug, oralMorphineEquivalent } from './oral-morphine-equivalent.js';

describe('oralMorphineEquivalent', () => {
  it('IV morphine 10 mg is oral morphine 30 mg', () => {
    // NCI PDQ Cancer Pain, health professional version, equianalgesic table.
    expect(oralMorphineEquivalent('morphine', 10, 'mg')).toBe(30);
    expect(oralMorphineEquivalent('morphine', 1, 'mg')).toBe(3);
  });

  it('IV fentanyl 100 mcg is IV morphine 10 mg, so oral morphine 30 mg', () => {
    // NCI PDQ Cancer Pain, health professional version, equianalgesic table.
    expect(oralMorphineEquivalent('fentanyl', 100, 'mcg')).toBe(30);
    expect(oralMorphineEquivalent('fentanyl', 1, 'mcg')).toBe(0.3);
  });

  it('IV hydromorphone 1.5 mg is IV morphine 10 mg, so oral morphine 30 mg', () => {
    // Pennsylvania Patient Safety Advisory, 2007 (hydromorphone ≈ morphine), with NCI PDQ
    // Cancer Pain, health professional version, equianalgesic table (IV → oral morphine).
    expect(oralMorphineEquivalent('hydromorphone', 1.5, 'mg')).toBe(30);
    expect(oralMorphineEquivalent('hydromorphone', 1, 'mg')).toBe(20);
  });

  it('converts mg and mcg before applying the factor (1 mg = 1000 mcg, checked against UCUM in units.spec.ts)', () => {
    expect(oralMorphineEquivalent('fentanyl', 0.1, 'mg')).toBe(30);
    expect(oralMorphineEquivalent('morphine', 10000, 'mcg')).toBe(30);
    expect(oralMorphineEquivalent('hydromorphone', 1500, 'mcg')).toBe(30);
    expect(oralMorphineEquivalent('hydromorphone', 200, 'mcg')).toBe(4);
  });

  it('is NaN for an amount that cannot be right', () => {
    expect(oralMorphineEquivalent('morphine', -1, 'mg')).toBeNaN();
    expect(oralMorphineEquivalent('morphine', Number.NaN, 'mg')).toBeNaN();
    expect(oralMorphineEquivalent('fentanyl', Infinity, 'mcg')).toBeNaN();
    expect(oralMorphineEquivalent('morphine', 0, 'mg')).toBe(0);
    // A drug outside the table, e.g. from an untyped request body.
    expect(oralMorphineEquivalent('oxycodone' as EquianalgesicDrug, 10, 'mg')).toBeNaN();
  });
});
