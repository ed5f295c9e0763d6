import { describe, expect, it } from 'vitest';
import { diffLibrary, type NamedRule } from './diff-library.js';

// Demo values (invented): Wren's paediatric morphine rule with a demand ceiling.
const children: NamedRule = {
  drugId: 1,
  drugName: 'morphine',
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: true,
  population: 'paediatric',
  minAgeYears: 1,
  maxAgeYears: 18,
  minWeightKg: 10,
  maxWeightKg: null,
  limits: { demandDose: { softMax: 0.02, hardMax: 0.03, ceiling: 1.5 } },
};
const adult: NamedRule = {
  drugId: 1,
  drugName: 'morphine',
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: false,
  limits: { demandDose: { hardMax: 3 } },
};

describe('diffLibrary with populations and ceilings', () => {
  it('shows a changed ceiling like any other limit', () => {
    const raised = { ...children, limits: { demandDose: { softMax: 0.02, hardMax: 0.03, ceiling: 3 } } };
    expect(diffLibrary([children], [raised]).changed).toEqual([
      {
        drugName: 'morphine',
        concentrationPerMl: 1,
        doseUnit: 'mg',
        changes: [{ field: 'demandDose', limit: 'ceiling', from: 1.5, to: 3 }],
      },
    ]);
  });

  it('tells an adult and a paediatric rule for one drug and concentration apart; a new band is a rule removed and one added', () => {
    expect(diffLibrary([adult, children], [adult, children])).toEqual({ added: [], removed: [], changed: [] });
    // An adult rule saved with its population and one read from a file without it are the same rule.
    expect(diffLibrary([{ ...adult, population: 'adult', minAgeYears: null }], [adult]).changed).toEqual([]);
    const narrower = { ...children, minAgeYears: 5 };
    expect(diffLibrary([adult, children], [adult, narrower])).toMatchObject({ added: [narrower], removed: [children], changed: [] });
  });
});
