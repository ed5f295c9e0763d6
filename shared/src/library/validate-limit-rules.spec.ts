import { describe, expect, it } from 'vitest';
import type { LimitRuleInput } from './library.schema.js';
import { limitOrderProblems, validateLimitRules } from './validate-limit-rules.js';

// The ordering hard min ≤ soft min ≤ soft max ≤ hard max is what makes "hard blocks, soft asks for
// a reason" coherent [read, Cummings & McGowan, Nursing 2011;41(3):58-59: hard limits cannot be
// overridden, soft limits warn]. The values are illustrative (demo library), not published.
const morphine: LimitRuleInput = {
  drugId: 1,
  concentrationPerMl: 1,
  doseUnit: 'mg',
  perKg: false,
  limits: { demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 4 }, lockoutMinutes: { hardMin: 5 } },
};

describe('validateLimitRules', () => {
  it('accepts ordered limits with gaps', () => {
    expect(validateLimitRules([morphine])).toEqual([]);
    expect(limitOrderProblems({ hardMin: 1, hardMax: 1 }, 'x', 'Demand dose')).toEqual([]);
  });

  it('names the limit that is out of order', () => {
    const swapped = { ...morphine, limits: { demandDose: { softMin: 0.5, softMax: 2, hardMax: 1.5 } } };
    expect(validateLimitRules([swapped])).toEqual([
      { path: 'rules.0.limits.demandDose.hardMax', message: 'Demand dose: the hard maximum (1.5) is below the soft maximum (2)' },
    ]);
  });

  it('refuses a limit or concentration that is infinite or beyond its bound, by path (never stored as no limit)', () => {
    const wild = { ...morphine, concentrationPerMl: 1e6, limits: { demandDose: { hardMax: Infinity }, lockoutMinutes: { hardMin: 5000 } } };
    expect(validateLimitRules([wild])).toEqual([
      { path: 'rules.0.concentrationPerMl', message: 'Concentration is at most 10000 per mL; this is 1000000' },
      { path: 'rules.0.limits.demandDose.hardMax', message: 'Demand dose: a limit must be a finite number' },
      { path: 'rules.0.limits.lockoutMinutes.hardMin', message: 'Lockout: a limit is at most 1440 minutes; this is 5000' },
    ]);
    const ceiling = { ...morphine, perKg: true, limits: { demandDose: { softMax: 0.02, hardMax: 0.03, ceiling: 1e9 } } };
    expect(validateLimitRules([ceiling]).filter((p) => p.path.endsWith('ceiling'))).toContainEqual({
      path: 'rules.0.limits.demandDose.ceiling',
      message: 'Demand dose: a limit is at most 10000 (in the dose unit); this is 1000000000',
    });
  });

  it('refuses two rules for one drug at one concentration, but allows another concentration', () => {
    const other = { ...morphine, concentrationPerMl: 2 };
    expect(validateLimitRules([morphine, other])).toEqual([]);
    const problems = validateLimitRules([morphine, other, { ...morphine }]);
    expect(problems).toEqual([
      { path: 'rules.2.concentrationPerMl', message: 'Rule 3 repeats rule 1: one rule per drug, concentration and population' },
    ]);
  });
});
