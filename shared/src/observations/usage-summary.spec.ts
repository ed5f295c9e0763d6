import { describe, expect, it } from 'vitest';
import { usageSummary, type SyringeReading } from './usage-summary.js';

// Worked example (arithmetic by definition): morphine 1 mg/mL, syringe started 08:00 with zero
// counters, readings at 09:00 and 10:00, a 2 mg clinician bolus at 09:30.
const readings: SyringeReading[] = [
  { syringeId: 1, at: '2026-12-02T08:00:00Z', attempts: 0, delivered: 0, volumeInfusedMl: 0 },
  { syringeId: 1, at: '2026-12-02T09:00:00Z', attempts: 6, delivered: 4, volumeInfusedMl: 4 },
  { syringeId: 1, at: '2026-12-02T10:00:00Z', attempts: 9, delivered: 7, volumeInfusedMl: 7 },
];
// Morphine's row of the equianalgesic table as shipped: NCI PDQ Cancer Pain (health professional
// version), approximate equianalgesic table, National Cancer Institute, 2008 and 2014 —
// parenteral morphine 10 mg ≈ oral morphine 30 mg.
const MORPHINE_CONVERSION = { parenteralAmount: 10, parenteralUnit: 'mg' as const, oralMorphineMg: 30 };
const morphine = { concentrationPerMl: 1, doseUnit: 'mg' as const, conversion: MORPHINE_CONVERSION };

describe('usageSummary', () => {
  it('puts each difference in the hour of the later reading and adds boluses', () => {
    const summary = usageSummary(readings, [{ at: '2026-12-02T09:30:00Z', amount: 2 }], morphine, new Date('2026-12-02T10:00:00Z'), 3);
    expect(summary.buckets).toEqual([
      { start: '2026-12-02T07:00:00.000Z', attempts: 0, delivered: 0, dose: 0, bolusDose: 0 },
      { start: '2026-12-02T08:00:00.000Z', attempts: 0, delivered: 0, dose: 0, bolusDose: 0 },
      { start: '2026-12-02T09:00:00.000Z', attempts: 6, delivered: 4, dose: 4, bolusDose: 2 },
    ]);
    // The 10:00 reading falls in the 10:00–11:00 hour, outside a window that ends at 10:00.
    expect(summary.rolling24hDose).toBe(9); // 4 + 3 mg by pump + 2 mg bolus
  });

  it('gives the 24-hour total as oral morphine: parenteral morphine × 3 (NCI PDQ Cancer Pain, equianalgesic table, 2008 and 2014)', () => {
    const summary = usageSummary(readings, [], morphine, new Date('2026-12-02T10:30:00Z'), 24);
    expect(summary.rolling24hDose).toBe(7);
    expect(summary.oralMorphineEquivalent24hMg).toBe(21);
    expect(summary.totals).toMatchObject({ attempts: 9, delivered: 7, dose: 7 });
    expect(summary.averageDosePerHour).toBeCloseTo(7 / 24, 10);
  });

  it('gives no oral-morphine figure, never 0, when pharmacy has set no factor for the drug', () => {
    const summary = usageSummary(readings, [], { ...morphine, conversion: null }, new Date('2026-12-02T10:30:00Z'), 24);
    expect(summary.rolling24hDose).toBe(7);
    expect(summary.oralMorphineEquivalent24hMg).toBeNull();
    const broken = { ...morphine, conversion: { ...MORPHINE_CONVERSION, parenteralAmount: 0 } };
    expect(usageSummary(readings, [], broken, new Date('2026-12-02T10:30:00Z'), 24).oralMorphineEquivalent24hMg).toBeNull();
  });

  it('never subtracts across syringes (counters restart with each syringe)', () => {
    const changed: SyringeReading[] = [
      ...readings,
      { syringeId: 2, at: '2026-12-02T10:05:00Z', attempts: 0, delivered: 0, volumeInfusedMl: 0 },
      { syringeId: 2, at: '2026-12-02T11:00:00Z', attempts: 2, delivered: 2, volumeInfusedMl: 2 },
    ];
    expect(usageSummary(changed, [], morphine, new Date('2026-12-02T11:00:00Z'), 24).rolling24hDose).toBe(9);
  });
});
