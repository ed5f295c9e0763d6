import { describe, expect, it } from 'vitest';
import { versionDiffSchema } from '@lockstep/shared';

// The shape the server sends for GET /library/versions/:id/diff (demo values).
const answer = {
  added: [
    { drugId: 3, drugName: 'fentanyl', concentrationPerMl: 10, doseUnit: 'mcg', perKg: false, limits: { demandDose: { softMax: 20 } } },
  ],
  removed: [],
  changed: [
    {
      drugName: 'morphine',
      concentrationPerMl: 1,
      doseUnit: 'mg',
      changes: [
        { field: 'demandDose', limit: 'softMax', from: 2, to: 1.5 },
        { field: 'loadingDose', limit: 'hardMin', from: null, to: 0.5 },
        { field: 'perKg', from: false, to: true },
        { field: 'doseUnit', from: 'mg', to: 'mcg' },
      ],
    },
  ],
  againstVersionId: 1,
};

describe('versionDiffSchema', () => {
  it('reads the diff answer', () => {
    expect(versionDiffSchema.parse(answer)).toEqual(answer);
  });

  it('refuses changes it does not know', () => {
    const bad = (change: unknown) => ({ ...answer, changed: [{ ...answer.changed[0], changes: [change] }] });
    expect(versionDiffSchema.safeParse(bad({ field: 'demandDose', limit: 'softest', from: 1, to: 2 })).success).toBe(false);
    expect(versionDiffSchema.safeParse(bad({ field: 'weight', limit: 'softMax', from: 1, to: 2 })).success).toBe(false);
    expect(versionDiffSchema.safeParse(bad({ field: 'perKg', from: 'no', to: true })).success).toBe(false);
    expect(versionDiffSchema.safeParse(bad({ field: 'demandDose', limit: 'softMax', from: '2', to: 1 })).success).toBe(false);
  });
});
