import { describe, expect, it } from 'vitest';
import { projectionFlags, SYRINGE_READING_TOLERANCE_ML } from './projection-flags.js';

describe('projectionFlags', () => {
  // 1 mL for reading a syringe's graduations: Lockstep's own tolerance (common practice).
  it('infused plus remaining more than the syringe held asks to check the syringe reading', () => {
    expect(SYRINGE_READING_TOLERANCE_ML).toBe(1);
    expect(projectionFlags({ volumeInfusedMl: 10, syringeRemainingMl: 41 }, 50, 1, 0)).toEqual([]);
    const flags = projectionFlags({ volumeInfusedMl: 10, syringeRemainingMl: 45 }, 50, 1, 0);
    expect(flags).toEqual([
      expect.objectContaining({ severity: 'review', code: 'syringe.reading', message: expect.stringContaining('50 mL syringe') }),
    ]);
  });

  it('a time to empty that cannot be worked out asks to check the syringe reading', () => {
    expect(projectionFlags({ volumeInfusedMl: 10, syringeRemainingMl: Number.NaN }, null, 1, 0)).toHaveLength(1);
    expect(projectionFlags({ volumeInfusedMl: 10, syringeRemainingMl: 40 }, null, Number.NaN, 0)).toHaveLength(1);
  });

  it('nothing flowing (no basal, no recent demand) is not an impossible projection', () => {
    expect(projectionFlags({ volumeInfusedMl: 0, syringeRemainingMl: 50 }, 50, 0, 0)).toEqual([]);
  });
});
