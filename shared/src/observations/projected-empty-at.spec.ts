import { describe, expect, it } from 'vitest';
import { projectedEmptyAt } from './projected-empty-at.js';

// Worked example (arithmetic by definition: hours until empty, docs/design.md "Order fields and
// dosing conventions"): 1 mL/h basal; 5 mL infused over the last hour, so 4 mL/h demand; 10 mL
// left → 10 ÷ 5 = 2 h after the last reading.
describe('projectedEmptyAt', () => {
  it('uses basal plus recent demand use', () => {
    const readings = [
      { at: '2026-12-02T08:00:00Z', volumeInfusedMl: 0 },
      { at: '2026-12-02T09:00:00Z', volumeInfusedMl: 5 },
    ];
    expect(projectedEmptyAt(readings, 10, 1)).toBe('2026-12-02T11:00:00.000Z');
  });

  it('does not project a demand rate from readings minutes apart [practice]', () => {
    const readings = [
      { at: '2026-12-02T08:00:00Z', volumeInfusedMl: 0 },
      { at: '2026-12-02T08:00:30Z', volumeInfusedMl: 2 },
    ];
    expect(projectedEmptyAt(readings, 48, 0)).toBeNull();
  });

  it('is null when nothing flows or there is no reading', () => {
    expect(projectedEmptyAt([{ at: '2026-12-02T09:00:00Z', volumeInfusedMl: 0 }], 10, 0)).toBeNull();
    expect(projectedEmptyAt([], 10, 1)).toBeNull();
  });
});
