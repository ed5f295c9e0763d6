import { describe, expect, it } from 'vitest';
import { diffLibrary, isEmptyDiff, type NamedRule } from './diff-library.js';

// Demo values only (invented); the diff is plain set arithmetic.
const morphine: NamedRule = {
  drugId: 1,
  drugName: 'morphine',
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: false,
  limits: { demandDose: { softMin: 0.5, softMax: 2, hardMax: 4 } },
};
const fentanyl: NamedRule = { drugId: 3, drugName: 'fentanyl', concentrationPerMl: 10, doseUnit: 'mcg', perKg: false, limits: {} };
const hydromorphone: NamedRule = {
  drugId: 2,
  drugName: 'hydromorphone',
  concentrationPerMl: 0.2,
  doseUnit: 'mg',
  perKg: false,
  limits: {},
};

describe('diffLibrary', () => {
  it('is empty for identical rule sets', () => {
    expect(isEmptyDiff(diffLibrary([morphine, fentanyl], [fentanyl, { ...morphine }]))).toBe(true);
  });

  it('lists added and removed rules', () => {
    const diff = diffLibrary([morphine, fentanyl], [morphine, hydromorphone]);
    expect(diff.added.map((r) => r.drugName)).toEqual(['hydromorphone']);
    expect(diff.removed.map((r) => r.drugName)).toEqual(['fentanyl']);
    expect(diff.changed).toEqual([]);
  });

  it('names each changed limit with its old and new value', () => {
    const tighter = { ...morphine, limits: { demandDose: { softMin: 0.5, softMax: 1.5, hardMax: 4 }, lockoutMinutes: { hardMin: 5 } } };
    expect(diffLibrary([morphine], [tighter]).changed).toEqual([
      {
        drugName: 'morphine',
        concentrationPerMl: 1,
        doseUnit: 'mg',
        changes: [
          { field: 'demandDose', limit: 'softMax', from: 2, to: 1.5 },
          { field: 'lockoutMinutes', limit: 'hardMin', from: null, to: 5 },
        ],
      },
    ]);
  });

  it('treats another concentration of the same drug as another rule', () => {
    const diff = diffLibrary([morphine], [{ ...morphine, concentrationPerMl: 2 }]);
    expect(diff.added).toHaveLength(1);
    expect(diff.removed).toHaveLength(1);
  });
});
