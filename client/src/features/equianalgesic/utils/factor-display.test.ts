import { describe, expect, it } from 'vitest';
import { DEFAULT_EQUIANALGESIC_FACTORS, type EquianalgesicFactor } from '@lockstep/shared';
import { describeFactor, drugsWithoutFactor, isReferenceRow, oralMorphinePerUnit } from './factor-display';

const IDS: Record<string, number> = { morphine: 1, hydromorphone: 2, fentanyl: 3 };
// The shipped table: NCI PDQ Cancer Pain (health professional version), equianalgesic table,
// National Cancer Institute, 2008 and 2014.
const TABLE: EquianalgesicFactor[] = DEFAULT_EQUIANALGESIC_FACTORS.map((factor) => ({
  ...factor,
  drugId: IDS[factor.genericName],
  changedByName: null,
  changedAt: '2026-11-03T10:00:00.000Z',
}));
const row = (name: string, route = 'parenteral') => TABLE.find((factor) => factor.genericName === name && factor.route === route)!;

describe('equianalgesic factor display', () => {
  it('says what each row means, with tall-man names', () => {
    expect(describeFactor(row('hydromorphone'))).toBe('HYDROmorphone 2 mg parenteral ≈ 10 mg parenteral morphine');
    expect(describeFactor(row('fentanyl'))).toBe('fentaNYL 100 mcg parenteral ≈ 10 mg parenteral morphine');
    expect(describeFactor(row('morphine', 'oral'))).toBe('morphine 30 mg oral ≈ 10 mg parenteral morphine');
  });

  it('gives one unit as oral morphine (NCI PDQ: hydromorphone 1 mg ≈ 15 mg, fentanyl 1 mcg ≈ 0.3 mg, morphine 1 mg ≈ 3 mg)', () => {
    expect(oralMorphinePerUnit(row('hydromorphone'), TABLE)).toBe('1 mg ≈ 15 mg oral morphine');
    expect(oralMorphinePerUnit(row('fentanyl'), TABLE)).toBe('1 mcg ≈ 0.3 mg oral morphine');
    expect(oralMorphinePerUnit(row('morphine'), TABLE)).toBe('1 mg ≈ 3 mg oral morphine');
    expect(oralMorphinePerUnit(row('morphine', 'oral'), TABLE)).toBeNull();
    expect(
      oralMorphinePerUnit(
        row('hydromorphone'),
        TABLE.filter((factor) => factor.route !== 'oral'),
      ),
    ).toBeNull();
  });

  it('finds formulary drugs with no parenteral factor, by id', () => {
    const drugs = [
      { id: 1, genericName: 'morphine', doseUnit: 'mg' as const },
      { id: 2, genericName: 'hydromorphone', doseUnit: 'mg' as const },
      { id: 7, genericName: 'sufentanil', doseUnit: 'mcg' as const },
    ];
    expect(drugsWithoutFactor(drugs, TABLE).map((drug) => drug.id)).toEqual([7]);
  });

  it('marks parenteral morphine as the reference', () => {
    expect(isReferenceRow(row('morphine'), TABLE)).toBe(true);
    expect(isReferenceRow(row('morphine', 'oral'), TABLE)).toBe(false);
    expect(isReferenceRow(row('hydromorphone'), TABLE)).toBe(false);
  });
});
