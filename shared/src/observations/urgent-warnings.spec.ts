import { describe, expect, it } from 'vitest';
import { observationFlags, type ObservationValues } from './observation-flags.js';
import { urgentWarnings } from './urgent-warnings.js';
import { DEFAULT_WARD_POLICY } from './ward-policy.js';

const calm: ObservationValues = {
  at: '2026-12-03T10:00:00Z',
  painScore: 3,
  sedationLevel: '1',
  respiratoryRate: 14,
  spo2: 97,
  attempts: 4,
  delivered: 3,
  volumeInfusedMl: 3,
  syringeRemainingMl: 47,
};

describe('urgentWarnings', () => {
  it('warns while typing of exactly what saving raises as urgent (Pasero & McCaffery, 2011, for sedation; the ward’s thresholds for breathing)', () => {
    for (const change of [
      { sedationLevel: '3' as const },
      { sedationLevel: '4' as const },
      { respiratoryRate: 7 },
      { respiratoryRate: 8 },
      { spo2: 89 },
      { spo2: 90 },
      {},
    ]) {
      const values = { ...calm, ...change };
      const warned = Object.keys(urgentWarnings(values, DEFAULT_WARD_POLICY)).length > 0;
      const raised = observationFlags(values, null, 0, DEFAULT_WARD_POLICY).some((flag) => flag.severity === 'urgent');
      expect(warned, JSON.stringify(change)).toBe(raised);
    }
  });

  it('says the scale’s action and the threshold crossed; nothing for values not typed yet', () => {
    expect(urgentWarnings({ sedationLevel: '3' }, undefined).sedationLevel).toMatch(/reduce the opioid dose by 25–50 %/);
    expect(urgentWarnings({ respiratoryRate: 6, spo2: 85 }, DEFAULT_WARD_POLICY)).toEqual({
      respiratoryRate: 'Below the ward’s 9/min: saving raises an urgent flag',
      spo2: 'Below the ward’s 92 %: saving raises an urgent flag',
    });
    expect(urgentWarnings({ respiratoryRate: null, spo2: null, sedationLevel: '' }, DEFAULT_WARD_POLICY)).toEqual({});
  });
});
