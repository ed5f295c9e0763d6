import { describe, expect, it } from 'vitest';
import { oralMorphineEquivalent } from '../dose/oral-morphine-equivalent.js';
import {
  conversionFor,
  DEFAULT_EQUIANALGESIC_FACTORS,
  equianalgesicAmountProblem,
  referenceDrugId,
  updateEquianalgesicFactorSchema,
} from './equianalgesic.js';

const MORPHINE = 1;
const HYDROMORPHONE = 2;
const FENTANYL = 3;
const OXYCODONE = 9;
const ID: Record<string, number> = { morphine: MORPHINE, hydromorphone: HYDROMORPHONE, fentanyl: FENTANYL };
const TABLE = DEFAULT_EQUIANALGESIC_FACTORS.map(({ genericName, ...factor }) => ({ drugId: ID[genericName], ...factor }));

describe('the shipped equianalgesic table', () => {
  it('follows NCI PDQ Cancer Pain (health professional version), equianalgesic table, 2008 and 2014', () => {
    // Parenteral morphine 10 mg ≈ oral morphine 30 mg; parenteral hydromorphone 2 mg ≈ parenteral
    // morphine 10 mg; parenteral fentanyl 100 mcg ≈ parenteral morphine 10 mg.
    expect(TABLE.map(({ drugId, route, amount, unit }) => [drugId, route, amount, unit])).toEqual([
      [MORPHINE, 'parenteral', 10, 'mg'],
      [MORPHINE, 'oral', 30, 'mg'],
      [HYDROMORPHONE, 'parenteral', 2, 'mg'],
      [FENTANYL, 'parenteral', 100, 'mcg'],
    ]);
    for (const factor of TABLE.filter((row) => row.amount !== 10)) expect(factor.source).toContain('NCI PDQ Cancer Pain');
  });

  it('gives 1 mg hydromorphone ≈ 15 mg, 10 mg morphine ≈ 30 mg and 100 mcg fentanyl ≈ 30 mg oral morphine (NCI PDQ)', () => {
    const oral = (drugId: number, amount: number, unit: 'mg' | 'mcg') =>
      oralMorphineEquivalent(amount, unit, conversionFor(drugId, TABLE)!.conversion);
    expect(oral(HYDROMORPHONE, 1, 'mg')).toBe(15);
    expect(oral(MORPHINE, 10, 'mg')).toBe(30);
    expect(oral(FENTANYL, 100, 'mcg')).toBe(30);
  });
});

describe('conversionFor', () => {
  it('matches the drug by formulary id and takes the one oral row', () => {
    const found = conversionFor(HYDROMORPHONE, TABLE)!;
    expect(found.conversion).toEqual({ parenteralAmount: 2, parenteralUnit: 'mg', oralMorphineMg: 30 });
    expect(found.parenteral.drugId).toBe(HYDROMORPHONE);
    expect(found.oral).toMatchObject({ drugId: MORPHINE, route: 'oral' });
  });

  it('is null for a drug with no row, or with no oral row (no figure, never 0)', () => {
    expect(conversionFor(OXYCODONE, TABLE)).toBeNull();
    expect(
      conversionFor(
        HYDROMORPHONE,
        TABLE.filter((row) => row.route !== 'oral'),
      ),
    ).toBeNull();
  });

  it('reads an oral factor written in mcg as mg', () => {
    const table = TABLE.map((row) => (row.route === 'oral' ? { ...row, amount: 30_000, unit: 'mcg' as const } : row));
    expect(conversionFor(MORPHINE, table)!.conversion.oralMorphineMg).toBe(30);
  });

  it('names morphine, the drug of the oral row, as the reference', () => {
    expect(referenceDrugId(TABLE)).toBe(MORPHINE);
    expect(referenceDrugId([])).toBeNull();
  });
});

describe('equianalgesicAmountProblem', () => {
  it('takes 1 mcg to 1,000 mg (a plausibility bound, Lockstep’s own, not a clinical value)', () => {
    expect(equianalgesicAmountProblem(1.5, 'mg', false)).toBeNull();
    expect(equianalgesicAmountProblem(1, 'mcg', false)).toBeNull();
    expect(equianalgesicAmountProblem(1000, 'mg', false)).toBeNull();
    expect(equianalgesicAmountProblem(0.5, 'mcg', false)).toBe('At least 1 mcg: check the amount');
    expect(equianalgesicAmountProblem(1001, 'mg', false)).toBe('At most 1,000 mg: check the amount');
    expect(equianalgesicAmountProblem(1_000_001, 'mcg', false)).toBe('At most 1,000 mg: check the amount');
  });

  it('refuses 0, negatives and non-finite values instead of reading them as no limit', () => {
    for (const bad of [0, -1, Number.NaN, Infinity])
      expect(equianalgesicAmountProblem(bad, 'mg', false)).toBe('Amount must be more than 0');
  });

  it('keeps the reference, parenteral morphine 10 mg, at 10 mg', () => {
    expect(equianalgesicAmountProblem(10, 'mg', true)).toBeNull();
    expect(equianalgesicAmountProblem(10_000, 'mcg', true)).toBeNull();
    expect(equianalgesicAmountProblem(8, 'mg', true)).toMatch(/reference/);
  });
});

describe('updateEquianalgesicFactorSchema', () => {
  const valid = { amount: 1.5, unit: 'mg', source: 'American Family Physician 2000;61(3):755', signature: { password: 'x' } };

  it('takes a signed amount, unit and source', () => {
    expect(updateEquianalgesicFactorSchema.parse({ ...valid, source: '  AFP 2000  ' }).source).toBe('AFP 2000');
  });

  it.each([
    [{ amount: 0 }, 'Amount must be more than 0'],
    [{ amount: '1.5' }, 'Amount must be a number'],
    [{ amount: null }, 'Enter the amount'],
    [{ unit: 'g' }, 'Unit must be mg or mcg'],
    [{ source: '   ' }, 'Name the source of this factor'],
    [{ source: 'x'.repeat(501) }, 'Source is at most 500 characters'],
  ])('refuses %o', (change, message) => {
    const result = updateEquianalgesicFactorSchema.safeParse({ ...valid, ...change });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].message).toBe(message);
  });

  it('refuses an infinite amount', () => {
    expect(updateEquianalgesicFactorSchema.safeParse({ ...valid, amount: Infinity }).success).toBe(false);
  });
});
