import { describe, expect, it } from 'vitest';
import { paediatricVitalBand } from './paediatric-vital-bands.js';

// Normal ranges: the APLS (Advanced Life Support Group) ranges as published in Fleming S, Thompson M, Stevens R,
// Heneghan C, Plüddemann A, Maconochie I, Tarassenko L, Mant D. Normal ranges of heart rate and respiratory rate in
// children from birth to 18 years of age: a systematic review of observational studies. Lancet 2011;377:1011–1018,
// web appendix, Web Box 1 (row APLS/PHPLS).
// Urgent rates: APAGBI Good Practice in Postoperative and Procedural Pain Management, 2012 (from memory).
describe('paediatricVitalBand (APLS ranges per Fleming et al., Lancet 2011; APAGBI 2012 urgent rates from memory)', () => {
  it('chooses the band at each age boundary', () => {
    expect(paediatricVitalBand(0)?.respiratoryRate).toEqual({ low: 30, high: 40 });
    expect(paediatricVitalBand(0)?.heartRate).toEqual({ low: 110, high: 160 });
    expect(paediatricVitalBand(1)?.respiratoryRate).toEqual({ low: 25, high: 35 });
    expect(paediatricVitalBand(2)?.heartRate).toEqual({ low: 95, high: 140 });
    expect(paediatricVitalBand(4)?.label).toBe('2 to 5 years');
    expect(paediatricVitalBand(5)?.respiratoryRate).toEqual({ low: 20, high: 25 });
    expect(paediatricVitalBand(11)?.respiratoryRateUrgentBelow).toBe(12);
    expect(paediatricVitalBand(12)?.respiratoryRate).toEqual({ low: 15, high: 20 });
    expect(paediatricVitalBand(15)?.heartRate).toEqual({ low: 60, high: 100 });
  });
  it('states every band of the published table (Fleming et al. 2011, Web Box 1, APLS/PHPLS row)', () => {
    const table = [0, 1, 2, 3, 4, 5, 6, 10, 12, 13, 17].map((age) => {
      const band = paediatricVitalBand(age)!;
      return [age, band.respiratoryRate.low, band.respiratoryRate.high, band.heartRate.low, band.heartRate.high];
    });
    expect(table).toEqual([
      [0, 30, 40, 110, 160],
      [1, 25, 35, 100, 150],
      [2, 25, 30, 95, 140],
      [3, 25, 30, 95, 140],
      [4, 25, 30, 95, 140],
      [5, 20, 25, 80, 120],
      [6, 20, 25, 80, 120],
      [10, 20, 25, 80, 120],
      [12, 15, 20, 60, 100],
      [13, 15, 20, 60, 100],
      [17, 15, 20, 60, 100],
    ]);
  });
  it('urgent respiratory rates by age: <20 under 1, <15 to age 5, <12 to 12, <10 over 12', () => {
    expect([0, 1, 2, 5, 12].map((age) => paediatricVitalBand(age)?.respiratoryRateUrgentBelow)).toEqual([20, 15, 15, 12, 10]);
  });
  it('gives no band for an unknown or impossible age (never a silent adult band)', () => {
    expect(paediatricVitalBand(null)).toBeNull();
    expect(paediatricVitalBand(-1)).toBeNull();
    expect(paediatricVitalBand(Number.NaN)).toBeNull();
  });
});
