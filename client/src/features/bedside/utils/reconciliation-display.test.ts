import { describe, expect, it } from 'vitest';
import { discrepancyText, previewDiscrepancy, reconciliationFlag, reconciliationRows } from './reconciliation-display';

describe('reconciliationRows', () => {
  it('shows a 50 mL syringe with 30 mL infused and 15 mL wasted as 5 mL unaccounted for', () => {
    expect(reconciliationRows({ dispensedMl: 50, infusedMl: 30, wastedMl: 15, discrepancyMl: 5 })).toEqual([
      { label: 'Dispensed', value: '50 mL' },
      { label: 'Infused', value: '30 mL' },
      { label: 'Wasted (witnessed)', value: '15 mL' },
      { label: 'Discrepancy', value: '5 mL unaccounted for' },
    ]);
  });
});

describe('discrepancyText', () => {
  it('says what a discrepancy means, in safe format', () => {
    expect(discrepancyText(0)).toBe('None: every mL is accounted for');
    expect(discrepancyText(0.25)).toBe('0.25 mL unaccounted for');
    expect(discrepancyText(-1.5)).toBe('1.5 mL more accounted for than was dispensed');
    expect(discrepancyText(Number.NaN)).toMatch(/Cannot be worked out/);
  });
});

describe('previewDiscrepancy', () => {
  it('works out dispensed − infused − wasted once both volumes are in, without float noise', () => {
    expect(previewDiscrepancy(50, 30, 15)).toBe(5);
    expect(previewDiscrepancy(20, 19.9, 0.1)).toBe(0);
    expect(previewDiscrepancy(50, 30, null)).toBeUndefined();
    expect(previewDiscrepancy(50, undefined, 1)).toBeUndefined();
  });
});

describe('reconciliationFlag', () => {
  const flag = (id: number, message: string, acknowledgedAt: string | null = null, code = 'reconciliation.discrepancy') => ({
    id,
    code,
    message,
    acknowledgedAt,
  });

  it('finds the open flag that names this syringe', () => {
    const flags = [
      flag(3, 'Syringe QX4-9MT: 1 mL unaccounted for'),
      flag(2, 'Syringe HK3-7QT: 5 mL unaccounted for'),
      flag(1, 'Sedation', null, 'observation.sedation'),
    ];
    expect(reconciliationFlag(flags, 'HK3-7QT')?.id).toBe(2);
    expect(reconciliationFlag(flags, 'ZZZ-ZZZ')?.id).toBe(3);
  });

  it('ignores acknowledged flags and other kinds', () => {
    expect(
      reconciliationFlag([flag(1, 'Syringe HK3-7QT', '2026-01-01T00:00:00Z'), flag(2, 'x', null, 'other')], 'HK3-7QT'),
    ).toBeUndefined();
  });
});
