import { describe, expect, it } from 'vitest';
import { paediatricVitalBand } from './paediatric-vital-bands.js';

// Normal ranges: Advanced Paediatric Life Support, Advanced Life Support Group, 6th ed., 2016 (from memory).
// Urgent rates: APAGBI Good Practice in Postoperative and Procedural Pain Management, 2012 (from memory).
describe('paediatricVitalBand (APLS 2016 normal values; APAGBI 2012 urgent rates; from memory)', () => {
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
  it('urgent respiratory rates by age: <20 under 1, <15 to age 5, <12 to 12, <10 over 12', () => {
    expect([0, 1, 2, 5, 12].map((age) => paediatricVitalBand(age)?.respiratoryRateUrgentBelow)).toEqual([20, 15, 15, 12, 10]);
  });
  it('gives no band for an unknown or impossible age (never a silent adult band)', () => {
    expect(paediatricVitalBand(null)).toBeNull();
    expect(paediatricVitalBand(-1)).toBeNull();
    expect(paediatricVitalBand(Number.NaN)).toBeNull();
  });
});
