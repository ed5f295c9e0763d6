import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { possibleTotalFindings, possibleTotals, possibleTotalsAgainstRule } from './possible-totals.js';
import type { LimitRule, Regimen } from './types.js';

// Every figure here is arithmetic on the definitions in docs/design.md, "Order fields and dosing
// conventions": basal × hours + demand × ceil(window ÷ lockout) + clinician boluses (one per window
// by default, Lockstep's own until boluses carry a count) + the loading dose in the first windows.
// Morphine 1 mg/mL, demand 1 mg, lockout 10 min: a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory].
const morphine: Regimen = { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 1, lockoutMinutes: 10, basalRatePerHour: 0 };
// The demo library's 1-hour and 4-hour maxima (invented demo values).
const rule: LimitRule = {
  doseUnit: 'mg',
  perKg: false,
  limits: { oneHourLimit: { softMax: 10, hardMax: 15 }, fourHourLimit: { softMax: 30, hardMax: 40 } },
};
const doses = (r: Regimen, options = {}) => {
  const t = possibleTotals(r, options);
  return [t.firstHour.dose, t.anyHour.dose, t.firstFourHours.dose, t.anyFourHours.dose];
};
const matched = { weightKg: null, doseUnitMatches: true };

describe('possibleTotals', () => {
  it('counts demand at the lockout rate, basal, the loading dose in the first windows and one bolus per window', () => {
    expect(doses(morphine)).toEqual([6, 6, 24, 24]);
    expect(doses({ ...morphine, basalRatePerHour: 0.5 })).toEqual([6.5, 6.5, 26, 26]);
    expect(doses({ ...morphine, loadingDose: 3 })).toEqual([9, 6, 27, 24]);
    expect(doses({ ...morphine, clinicianBolusDose: 2 })).toEqual([8, 8, 26, 26]);
    expect(doses({ ...morphine, clinicianBolusDose: 2 }, { clinicianBolusesPerFourHours: 3 })).toEqual([12, 12, 30, 30]);
  });

  it("is held by the order's own limits, any hour by the 4-hour limit and any 4 hours by 4 × the 1-hour limit", () => {
    const fast = { ...morphine, demandDose: 2, lockoutMinutes: 6 }; // 20 mg an hour, 80 mg in 4 hours
    expect(doses({ ...fast, oneHourLimit: 12 })).toEqual([12, 12, 48, 48]);
    expect(possibleTotals({ ...fast, oneHourLimit: 12 }).anyFourHours.cappedBy).toBe('oneHourLimit');
    expect(doses({ ...fast, fourHourLimit: 15 })).toEqual([15, 15, 15, 15]);
    expect(possibleTotals({ ...fast, fourHourLimit: 15 }).anyHour).toEqual({ dose: 15, uncapped: 20, cappedBy: 'fourHourLimit' });
  });

  it('gives NaN, never a figure that looks safe, for an unusable number', () => {
    expect(possibleTotals({ ...morphine, demandDose: Number.NaN }).anyHour.dose).toBeNaN();
  });

  it('property: no window ever exceeds a limit the order states, and first windows are never less than the others', () => {
    const amount = fc.integer({ min: 0, max: 10_000 }).map((n) => n / 100);
    fc.assert(
      fc.property(amount, fc.integer({ min: 1, max: 60 }), amount, amount, amount, amount, (d, l, b, load, one, four) => {
        const r: Regimen = {
          ...morphine,
          demandDose: d,
          lockoutMinutes: l,
          basalRatePerHour: b,
          loadingDose: load,
          oneHourLimit: one,
          fourHourLimit: four,
        };
        const t = possibleTotals(r);
        expect(t.firstHour.dose).toBeLessThanOrEqual(Math.min(one, four));
        expect(t.firstFourHours.dose).toBeLessThanOrEqual(Math.min(four, 4 * one) + 1e-9);
        expect(t.firstHour.dose).toBeGreaterThanOrEqual(t.anyHour.dose);
        expect(t.firstFourHours.dose).toBeGreaterThanOrEqual(t.anyFourHours.dose);
      }),
    );
  });
});

describe('possibleTotalsAgainstRule', () => {
  it('compares each window with the rule, per kg for a per-kg rule', () => {
    const rows = possibleTotalsAgainstRule({ ...morphine, demandDose: 2, lockoutMinutes: 6 }, rule, matched);
    expect(rows.map((row) => [row.window, row.total.dose, row.check])).toEqual([
      ['firstHour', 20, 'hard-high'],
      ['anyHour', 20, 'hard-high'],
      ['firstFourHours', 80, 'hard-high'],
      ['anyFourHours', 80, 'hard-high'],
    ]);
    // 24.5 kg child, 0.49 mg every 10 min: 2.94 mg (0.12 mg/kg) an hour, 11.76 mg (0.48 mg/kg) in 4 hours.
    const perKg: LimitRule = {
      ...rule,
      perKg: true,
      limits: { oneHourLimit: { softMax: 0.1, hardMax: 0.12 }, fourHourLimit: { softMax: 0.3, hardMax: 0.4 } },
    };
    const child = possibleTotalsAgainstRule({ ...morphine, demandDose: 0.49 }, perKg, { weightKg: 24.5, doseUnitMatches: true });
    expect(child.map((row) => [row.perKg, row.check])).toEqual([
      [0.12, 'soft-high'],
      [0.12, 'soft-high'],
      [0.48, 'hard-high'],
      [0.48, 'hard-high'],
    ]);
  });

  it('compares nothing while a number, the unit or the weight is unusable (each has its own error)', () => {
    expect(possibleTotalsAgainstRule({ ...morphine, lockoutMinutes: 0 }, rule, matched)).toEqual([]);
    expect(possibleTotalsAgainstRule({ ...morphine, fourHourLimit: Infinity }, rule, matched)).toEqual([]);
    expect(possibleTotalsAgainstRule(morphine, rule, { weightKg: null, doseUnitMatches: false })).toEqual([]);
    expect(possibleTotalsAgainstRule(morphine, { ...rule, perKg: true }, matched)).toEqual([]);
  });
});

describe('possibleTotalFindings', () => {
  it("leaves a window out when the order's own limit for it holds the figure: that limit's own check says so", () => {
    const fast = { ...morphine, demandDose: 2, lockoutMinutes: 6 };
    expect(possibleTotalFindings({ ...fast, oneHourLimit: 12, fourHourLimit: 30 }, rule, 'mg', matched)).toEqual([]);
    expect(possibleTotalFindings({ ...fast, fourHourLimit: 12 }, rule, 'mg', matched)).toEqual([
      {
        field: 'oneHourLimit',
        severity: 'soft',
        code: 'possible.one-hour.soft-high',
        message:
          "The pump could give up to 12 mg in an hour (demand 2 mg every 6 min, held to the order's 4-hour limit): above the soft maximum of 10 mg an hour",
      },
    ]);
  });

  it('names the loading dose when the first hour is the one over', () => {
    const [finding] = possibleTotalFindings({ ...morphine, loadingDose: 5, basalRatePerHour: 0.5 }, rule, 'mg', matched);
    expect(finding.message).toBe(
      'The pump could give up to 11.5 mg in the first hour (loading dose 5 mg, demand 1 mg every 10 min, basal 0.5 mg/h): above the soft maximum of 10 mg an hour',
    );
  });
});
