import { describe, expect, it } from 'vitest';
import { DO_NOT_INCREASE_ACTION, PAIN_NO_PRESSES_SCORE, painFlags } from './pain-flags.js';
import { DEFAULT_WARD_POLICY } from './ward-policy.js';

const start = { at: '2026-03-01T08:00:00.000Z', attempts: 0, delivered: 0, volumeInfusedMl: 0 };

describe('painFlags', () => {
  // 9/10 with no presses: Lockstep's own threshold (common practice), not a published value.
  it('pain 9 or more with no presses since the last reading asks to check the handset', () => {
    expect(PAIN_NO_PRESSES_SCORE).toBe(9);
    const flags = painFlags({ painScore: 9, attempts: 0, delivered: 0 }, start, DEFAULT_WARD_POLICY, false);
    expect(flags).toEqual([
      expect.objectContaining({ severity: 'review', code: 'pain.no-presses', action: expect.stringContaining('handset') }),
    ]);
    expect(painFlags({ painScore: 8, attempts: 0, delivered: 0 }, start, DEFAULT_WARD_POLICY, false)).toEqual([]);
    expect(painFlags({ painScore: 10, attempts: 1, delivered: 1 }, start, DEFAULT_WARD_POLICY, false)).toEqual([]);
  });

  it('pain not controlled (score and attempts per dose from the ward policy, common practice) reviews the regimen', () => {
    const flags = painFlags({ painScore: 8, attempts: 6, delivered: 2 }, start, DEFAULT_WARD_POLICY, false);
    expect(flags).toEqual([
      expect.objectContaining({ code: 'pain.not-controlled', action: expect.stringContaining('Review the regimen') }),
    ]);
  });

  // POSS sedation 3: reduce the opioid or notify, never increase it (Pasero C, 1994; Pasero &
  // McCaffery, Pain Assessment and Pharmacologic Management, 2011) [from memory for the wording].
  it('while sedation or breathing is a concern the pain flag says do not increase the opioid', () => {
    const notControlled = painFlags({ painScore: 8, attempts: 6, delivered: 2 }, start, DEFAULT_WARD_POLICY, true);
    expect(notControlled).toEqual([expect.objectContaining({ code: 'pain.not-controlled', action: DO_NOT_INCREASE_ACTION })]);
    expect(notControlled[0]!.action).not.toContain('Review the regimen');
    const noPresses = painFlags({ painScore: 9, attempts: 0, delivered: 0 }, start, DEFAULT_WARD_POLICY, true);
    expect(noPresses[0]!.action).toMatch(/^Do not increase the opioid/);
  });
});
