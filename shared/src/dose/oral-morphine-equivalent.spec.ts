import { describe, expect, it } from 'vitest';
import { oralMorphineEquivalent, type OralMorphineConversion } from './oral-morphine-equivalent.js';

// The factors come from pharmacy's table; these are its shipped defaults, from NCI PDQ Cancer Pain
// (health professional version), approximate equianalgesic table, National Cancer Institute (2008
// and 2014): parenteral morphine 10 mg ≈ oral morphine 30 mg; parenteral hydromorphone 2 mg ≈
// parenteral morphine 10 mg; parenteral fentanyl 100 mcg ≈ parenteral morphine 10 mg.
const ORAL_MORPHINE_MG = 30;
const MORPHINE: OralMorphineConversion = { parenteralAmount: 10, parenteralUnit: 'mg', oralMorphineMg: ORAL_MORPHINE_MG };
const HYDROMORPHONE: OralMorphineConversion = { parenteralAmount: 2, parenteralUnit: 'mg', oralMorphineMg: ORAL_MORPHINE_MG };
const FENTANYL: OralMorphineConversion = { parenteralAmount: 100, parenteralUnit: 'mcg', oralMorphineMg: ORAL_MORPHINE_MG };

describe('oralMorphineEquivalent', () => {
  it('parenteral morphine 10 mg is oral morphine 30 mg', () => {
    // NCI PDQ Cancer Pain, health professional version, equianalgesic table (2008, 2014).
    expect(oralMorphineEquivalent(10, 'mg', MORPHINE)).toBe(30);
    expect(oralMorphineEquivalent(1, 'mg', MORPHINE)).toBe(3);
  });

  it('parenteral fentanyl 100 mcg is parenteral morphine 10 mg, so oral morphine 30 mg', () => {
    // NCI PDQ Cancer Pain, health professional version, equianalgesic table (2008, 2014).
    expect(oralMorphineEquivalent(100, 'mcg', FENTANYL)).toBe(30);
    expect(oralMorphineEquivalent(1, 'mcg', FENTANYL)).toBe(0.3);
  });

  it('parenteral hydromorphone 2 mg is parenteral morphine 10 mg, so 1 mg is oral morphine 15 mg', () => {
    // NCI PDQ Cancer Pain, health professional version, equianalgesic table (2008, 2014): 2 mg,
    // not the 1.5 mg used before while citing a source that does not state it.
    expect(oralMorphineEquivalent(2, 'mg', HYDROMORPHONE)).toBe(30);
    expect(oralMorphineEquivalent(1, 'mg', HYDROMORPHONE)).toBe(15);
  });

  it('follows the factor pharmacy sets: hydromorphone 1.5 mg gives 1 mg ≈ oral morphine 20 mg', () => {
    // American Family Physician 2000;61(3):755, equianalgesic table: parenteral hydromorphone
    // 1.5 mg ≈ morphine 10 mg. Tables vary; the table in use is pharmacy's choice.
    const afp: OralMorphineConversion = { ...HYDROMORPHONE, parenteralAmount: 1.5 };
    expect(oralMorphineEquivalent(1.5, 'mg', afp)).toBe(30);
    expect(oralMorphineEquivalent(1, 'mg', afp)).toBe(20);
  });

  it('converts mg and mcg before applying the factor (1 mg = 1000 mcg, checked against UCUM in units.spec.ts)', () => {
    expect(oralMorphineEquivalent(0.1, 'mg', FENTANYL)).toBe(30);
    expect(oralMorphineEquivalent(10000, 'mcg', MORPHINE)).toBe(30);
    expect(oralMorphineEquivalent(2000, 'mcg', HYDROMORPHONE)).toBe(30);
    expect(oralMorphineEquivalent(200, 'mcg', HYDROMORPHONE)).toBe(3);
    // A factor stated in mcg for a drug dosed in mg, and the other way round.
    expect(oralMorphineEquivalent(1, 'mg', { ...HYDROMORPHONE, parenteralAmount: 2000, parenteralUnit: 'mcg' })).toBe(15);
  });

  it('is NaN for an amount that cannot be right', () => {
    expect(oralMorphineEquivalent(-1, 'mg', MORPHINE)).toBeNaN();
    expect(oralMorphineEquivalent(Number.NaN, 'mg', MORPHINE)).toBeNaN();
    expect(oralMorphineEquivalent(Infinity, 'mcg', FENTANYL)).toBeNaN();
    expect(oralMorphineEquivalent(0, 'mg', MORPHINE)).toBe(0);
    // A unit outside mg and mcg, e.g. from an untyped row.
    expect(oralMorphineEquivalent(10, 'g' as 'mg', MORPHINE)).toBeNaN();
  });

  it('is NaN, never 0 or infinite, for a factor that is not a finite number above 0', () => {
    for (const bad of [0, -2, Number.NaN, Infinity]) {
      expect(oralMorphineEquivalent(1, 'mg', { ...HYDROMORPHONE, parenteralAmount: bad })).toBeNaN();
      expect(oralMorphineEquivalent(1, 'mg', { ...HYDROMORPHONE, oralMorphineMg: bad })).toBeNaN();
    }
    expect(oralMorphineEquivalent(1, 'mg', { ...HYDROMORPHONE, parenteralUnit: 'g' as 'mg' })).toBeNaN();
  });
});
