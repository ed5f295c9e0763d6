import { describe, expect, it } from 'vitest';
import { SEDATION_LEVELS } from '@lockstep/shared';
import { isUnacceptableSedation, sedationFromNumber, sedationTick, sedationToNumber } from './sedation';

describe('sedation on a chart', () => {
  it('puts S (asleep, easy to arouse) at 0 and 1–4 at their own numbers', () => {
    expect(SEDATION_LEVELS.map(sedationToNumber)).toEqual([0, 1, 2, 3, 4]);
  });

  it('reads chart values back as levels, and nothing between levels', () => {
    expect(sedationFromNumber(0)).toBe('S');
    expect(sedationFromNumber(3)).toBe('3');
    expect(sedationFromNumber(2.5)).toBeNull();
    expect(sedationFromNumber(5)).toBeNull();
    expect([0, 1, 2, 3, 4, 1.5].map(sedationTick)).toEqual(['S', '1', '2', '3', '4', '']);
  });

  // Pasero Opioid-induced Sedation Scale (POSS), Pasero 1994; Pasero & McCaffery 2011: 3 and 4 are unacceptable.
  it('marks 3 and 4 unacceptable, S, 1 and 2 acceptable', () => {
    expect(SEDATION_LEVELS.filter(isUnacceptableSedation)).toEqual(['3', '4']);
  });
});
