import { describe, expect, it } from 'vitest';
import { changeFactorLabel, LARGE_CHANGE_FACTOR, largeLimitChanges, limitChangeSize } from './large-change.js';

// LARGE_CHANGE_FACTOR (2) is Lockstep's review threshold for the approver, a product setting and
// not a published clinical value; the limits below are invented demo values.
describe('large limit changes', () => {
  it('marks a change by a factor of 2 or more, either way, as large', () => {
    expect(LARGE_CHANGE_FACTOR).toBe(2);
    expect(limitChangeSize(15, 150)).toEqual({ kind: 'factor', factor: 10, large: true });
    expect(limitChangeSize(2, 4)).toEqual({ kind: 'factor', factor: 2, large: true });
    expect(limitChangeSize(4, 2)).toEqual({ kind: 'factor', factor: 0.5, large: true });
    expect(limitChangeSize(2, 3.9)?.large).toBe(false);
    expect(limitChangeSize(1.5, 2)?.large).toBe(false);
    expect(limitChangeSize(3, 3)).toBeNull();
    expect(limitChangeSize(null, null)).toBeNull();
  });

  it('marks a change to or from "no limit", or from or to 0, as large without a factor', () => {
    expect(limitChangeSize(null, 15)).toEqual({ kind: 'set', large: true });
    expect(limitChangeSize(15, null)).toEqual({ kind: 'cleared', large: true });
    expect(limitChangeSize(0, 1)).toEqual({ kind: 'from-zero', large: true });
    expect(limitChangeSize(1, 0)).toEqual({ kind: 'to-zero', large: true });
  });

  it('shows the factor as ×N raised and ÷N lowered', () => {
    expect(changeFactorLabel(limitChangeSize(15, 150)!)).toBe('×10');
    expect(changeFactorLabel(limitChangeSize(40, 4)!)).toBe('÷10');
    expect(changeFactorLabel(limitChangeSize(3, 10)!)).toBe('×3.33');
    expect(changeFactorLabel(limitChangeSize(null, 15)!)).toBeNull();
  });

  it('lists the large changes of a diff and leaves the small ones out', () => {
    const rule = { drugName: 'morphine', concentrationPerMl: 1, doseUnit: 'mg' };
    const large = largeLimitChanges({
      changed: [
        {
          ...rule,
          changes: [
            { field: 'demandDose', limit: 'softMax', from: 2, to: 1.5 },
            { field: 'oneHourLimit', limit: 'hardMax', from: 15, to: 150 },
            { field: 'fourHourLimit', limit: 'hardMax', from: 40, to: null },
            { field: 'perKg', from: false, to: true },
          ],
        },
      ],
    });
    expect(large.map(({ change, size }) => [change.field, size.kind])).toEqual([
      ['oneHourLimit', 'factor'],
      ['fourHourLimit', 'cleared'],
    ]);
    expect(large[0].rule).toEqual(rule);
  });
});
