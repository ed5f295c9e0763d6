import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkOrder } from './check-order.js';
import { hasBlockingFinding } from './signing-findings.js';
import { withoutFloatNoise } from './float-noise.js';
import { DOSE_FIELDS, REGIMEN_FIELDS } from './regimen-fields.js';
import type { Finding, LimitRule, Limits, PatientFactors, Regimen, RegimenField } from './types.js';

const codes = (findings: Finding[]) => findings.map((f) => `${f.field}:${f.code}`);

// A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: morphine 1 mg demand, lockout 10 minutes,
// at 1 mg/mL [practice; ASHP Standardize 4 Safety].
const ashpMorphine: Regimen = {
  doseUnit: 'mg',
  concentrationPerMl: 1,
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  fourHourLimit: 30,
};

// Morphine demand 0.5–2 mg, lockout 5–10 min, 4-hour limit 30 mg as soft limits: common practice
// (docs/clinical-sources.md, "Typical ranges"); hard limits illustrative, not published.
const morphineRule: LimitRule = {
  doseUnit: 'mg',
  perKg: false,
  limits: {
    demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 4 },
    lockoutMinutes: { hardMin: 4, softMin: 5, softMax: 10 },
    fourHourLimit: { softMax: 30 },
  },
};

const adult: PatientFactors = { weightKg: 70, ageYears: 45, opioidTolerant: false };

// Association of Paediatric Anaesthetists of Great Britain and Ireland, Good Practice in
// Postoperative and Procedural Pain Management: morphine PCA bolus 10–20 mcg/kg, lockout 5–10 min.
// 10–20 mcg/kg is 0.01–0.02 mg/kg (1 mg = 1000 mcg, checked against UCUM in units.spec.ts).
const paediatricRuleMcg: LimitRule = {
  doseUnit: 'mcg',
  perKg: true,
  limits: { demandDose: { hardMin: 10, hardMax: 20 }, lockoutMinutes: { hardMin: 5, softMax: 10 } },
};
const paediatricRuleMg: LimitRule = { ...paediatricRuleMcg, doseUnit: 'mg', limits: { demandDose: { hardMin: 0.01, hardMax: 0.02 } } };
// Concentration illustrative.
const childMcg: Regimen = { doseUnit: 'mcg', concentrationPerMl: 400, demandDose: 300, lockoutMinutes: 5, basalRatePerHour: 0 };
const childMg: Regimen = { ...childMcg, doseUnit: 'mg', concentrationPerMl: 0.4, demandDose: 0.3 };
const child20kg: PatientFactors = { weightKg: 20, ageYears: 7, opioidTolerant: false };

describe('checkOrder: adult morphine', () => {
  it('finds nothing for the common starting regimen', () => {
    expect(checkOrder(ashpMorphine, morphineRule, adult)).toEqual([]);
  });

  it('blocks a missed decimal point with a hard finding', () => {
    const findings = checkOrder({ ...ashpMorphine, demandDose: 10 }, morphineRule, adult);
    expect(findings).toEqual([
      { field: 'demandDose', severity: 'hard', code: 'limit.hard-high', message: 'Demand dose 10 mg is above the hard maximum 4 mg' },
    ]);
    expect(hasBlockingFinding(findings)).toBe(true);
  });

  it('asks for a reason on a soft finding without blocking', () => {
    const findings = checkOrder({ ...ashpMorphine, demandDose: 2.5 }, morphineRule, adult);
    expect(codes(findings)).toEqual(['demandDose:limit.soft-high']);
    expect(hasBlockingFinding(findings)).toBe(false);
  });

  it('needs a reason for a basal rate in an opioid-naive adult', () => {
    // Chou R et al., Management of Postoperative Pain, APS/ASRA/ASA guideline, J Pain 2016;17(2):131-157:
    // no routine basal infusion in opioid-naive adults. Written wrong before: a caution needing no reason.
    expect(codes(checkOrder({ ...ashpMorphine, basalRatePerHour: 1 }, morphineRule, adult))).toEqual([
      'basalRatePerHour:risk.basal-opioid-naive',
    ]);
    expect(checkOrder({ ...ashpMorphine, basalRatePerHour: 1 }, morphineRule, { ...adult, opioidTolerant: true })).toEqual([]);
  });

  it('returns every finding, worst first', () => {
    const r: Regimen = { ...ashpMorphine, demandDose: 3, lockoutMinutes: 3, basalRatePerHour: 1, oneHourLimit: 2 };
    const p: PatientFactors = { ...adult, sleepApnoea: true, ageYears: 82, otherSedatives: true };
    expect(codes(checkOrder(r, morphineRule, p))).toEqual([
      'oneHourLimit:consistency.one-hour-limit-below-basal-and-demand',
      'lockoutMinutes:limit.hard-low',
      'demandDose:limit.soft-high',
      'basalRatePerHour:risk.basal-opioid-naive',
      'basalRatePerHour:risk.older-with-basal',
      'demandDose:risk.naive-apnoea-sedatives',
      'patient:caution.sleep-apnoea',
      'patient:caution.age-65-or-over',
      'patient:caution.other-sedatives',
    ]);
  });

  it('gives errors, not limit findings, for numbers that cannot be right', () => {
    const r: Regimen = { ...ashpMorphine, demandDose: Number.NaN, lockoutMinutes: 0.5, concentrationPerMl: 0, fourHourLimit: -30 };
    expect(codes(checkOrder(r, morphineRule, adult))).toEqual([
      'concentrationPerMl:concentration.not-positive',
      'demandDose:number.not-finite',
      'fourHourLimit:number.negative',
      'lockoutMinutes:lockout.too-short',
      'lockoutMinutes:limit.hard-low',
    ]);
  });

  it('refuses a dose unit that differs from the rule and skips its dose limits', () => {
    const r: Regimen = { ...ashpMorphine, doseUnit: 'mcg', demandDose: 1000, concentrationPerMl: 1000, fourHourLimit: null };
    const findings = checkOrder(r, morphineRule, adult);
    expect(findings).toEqual([
      {
        field: 'doseUnit',
        severity: 'error',
        code: 'unit.mismatch',
        message: 'Dose unit mcg does not match the limit rule, which is in mg',
      },
    ]);
  });
});

// The children's checks (weight plausibility and date, per-kg ceilings) have their own spec
// (child-findings.spec.ts); these tests look at the per-kg limit arithmetic alone.
const CHILD_CHECK_CODES = [
  'weight.not-checked',
  'weight.implausible',
  'weight.undated',
  'weight.future-date',
  'weight.old',
  'limit.no-ceiling',
];
const withoutChildChecks = (findings: Finding[]) => findings.filter((f) => !CHILD_CHECK_CODES.includes(f.code));

describe('checkOrder: weight-based paediatric rule', () => {
  it('accepts a bolus inside 10–20 mcg/kg', () => {
    expect(withoutChildChecks(checkOrder(childMcg, paediatricRuleMcg, child20kg))).toEqual([]); // 300 mcg ÷ 20 kg = 15 mcg/kg
    expect(withoutChildChecks(checkOrder({ ...childMcg, demandDose: 400 }, paediatricRuleMcg, child20kg))).toEqual([]); // exactly 20 mcg/kg
  });

  it('compares per kg and says so in the message', () => {
    expect(checkOrder({ ...childMcg, demandDose: 600 }, paediatricRuleMcg, child20kg)[0].message).toBe(
      'Demand dose 30 mcg/kg is above the hard maximum 20 mcg/kg',
    );
    expect(checkOrder({ ...childMg, demandDose: 0.6 }, paediatricRuleMg, child20kg)[0].message).toBe(
      'Demand dose 0.03 mg/kg is above the hard maximum 0.02 mg/kg',
    );
    expect(checkOrder({ ...childMg, demandDose: 0.1 }, paediatricRuleMg, child20kg)[0].message).toBe(
      'Demand dose 0.005 mg/kg is below the hard minimum 0.01 mg/kg',
    );
  });

  it('counts a per-kg value equal to the limit as inside it despite float noise', () => {
    // 0.29 mg ÷ 29 kg is 0.009999999999999998 in binary; 0.58 ÷ 29 is 0.019999999999999997.
    expect(withoutChildChecks(checkOrder({ ...childMg, demandDose: 0.29 }, paediatricRuleMg, { ...child20kg, weightKg: 29 }))).toEqual([]);
    expect(withoutChildChecks(checkOrder({ ...childMg, demandDose: 0.58 }, paediatricRuleMg, { ...child20kg, weightKg: 29 }))).toEqual([]);
  });

  it('does not divide the lockout by weight', () => {
    expect(checkOrder({ ...childMcg, lockoutMinutes: 3 }, paediatricRuleMcg, child20kg)[0].message).toBe(
      'Lockout 3 min is below the hard minimum 5 min',
    );
  });

  it('needs a weight, and still checks the lockout without one', () => {
    for (const weightKg of [null, undefined, 0]) {
      const findings = checkOrder({ ...childMcg, demandDose: 600, lockoutMinutes: 3 }, paediatricRuleMcg, { ...child20kg, weightKg });
      expect(codes(withoutChildChecks(findings))).toEqual(['weightKg:weight.missing', 'lockoutMinutes:limit.hard-low']);
    }
    expect(codes(withoutChildChecks(checkOrder(childMcg, paediatricRuleMcg, { ...child20kg, weightKg: -20 })))).toEqual([
      'weightKg:weight.invalid',
    ]);
  });

  it('ignores weight for a rule that is not per kg', () => {
    expect(checkOrder(ashpMorphine, morphineRule, { ...adult, weightKg: null })).toEqual([]);
  });
});

describe('checkOrder: properties', () => {
  const typed = fc.integer({ min: 0, max: 100_000 }).map((n) => n / 100);
  const limits: fc.Arbitrary<Limits> = fc.record({ hardMin: fc.option(typed, { nil: null }), hardMax: fc.option(typed, { nil: null }) });
  const ruleLimits = fc.dictionary(fc.constantFrom(...REGIMEN_FIELDS), limits) as fc.Arbitrary<Partial<Record<RegimenField, Limits>>>;
  const regimen: fc.Arbitrary<Regimen> = fc.record({
    doseUnit: fc.constant('mg' as const),
    concentrationPerMl: typed.filter((c) => c > 0),
    loadingDose: fc.option(typed, { nil: null }),
    demandDose: typed,
    lockoutMinutes: typed,
    basalRatePerHour: typed,
    oneHourLimit: fc.option(typed, { nil: undefined }),
    fourHourLimit: fc.option(typed, { nil: undefined }),
    clinicianBolusDose: fc.option(typed, { nil: null }),
  });

  it('never misses a value outside a hard limit, per kg or not', () => {
    fc.assert(
      fc.property(
        regimen,
        ruleLimits,
        fc.boolean(),
        fc.integer({ min: 1, max: 200_000 }).map((g) => g / 1000),
        (r, l, perKg, weightKg) => {
          const findings = checkOrder(r, { doseUnit: 'mg', perKg, limits: l }, { weightKg, opioidTolerant: false });
          for (const field of REGIMEN_FIELDS) {
            const raw = r[field];
            const hard = l[field];
            if (raw === null || raw === undefined || hard === undefined) continue;
            const value = perKg && DOSE_FIELDS.includes(field) ? withoutFloatNoise(raw / weightKg) : raw;
            const outside = (hard.hardMin != null && value < hard.hardMin) || (hard.hardMax != null && value > hard.hardMax);
            // The stated value's own check (the pump's possible totals have findings of their own).
            const flagged = findings.some((f) => f.field === field && f.severity === 'hard' && f.code.startsWith('limit.'));
            expect(flagged, `${field} ${value} against ${JSON.stringify(hard)}`).toBe(outside);
          }
        },
      ),
    );
  });
});

describe('checkOrder: what the pump could give against the rule', () => {
  // The demo Cedar library's morphine 1 mg/mL rule (invented demo values, server/src/database/seed):
  // 1-hour soft 10 mg, hard 15 mg; 4-hour soft 30 mg, hard 40 mg.
  const cedar: LimitRule = {
    doseUnit: 'mg',
    perKg: false,
    limits: {
      demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 3 },
      lockoutMinutes: { hardMin: 5, softMin: 6, softMax: 15, hardMax: 30 },
      oneHourLimit: { softMax: 10, hardMax: 15 },
      fourHourLimit: { softMax: 30, hardMax: 40 },
    },
  };

  it('blocks demand 2 mg every 6 min with both limit fields empty: 20 mg an hour, 80 mg in 4 hours', () => {
    // Arithmetic on the definitions (docs/design.md): 2 mg × ceil(60 ÷ 6) = 20; 2 mg × ceil(240 ÷ 6) = 80.
    // Written wrong before: no findings, because the order stated no limits of its own.
    const r: Regimen = { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 2, lockoutMinutes: 6, basalRatePerHour: 0 };
    const findings = checkOrder(r, cedar, adult);
    expect(findings).toEqual([
      {
        field: 'oneHourLimit',
        severity: 'hard',
        code: 'possible.one-hour.hard-high',
        message: 'The pump could give up to 20 mg in an hour (demand 2 mg every 6 min): above the hard maximum of 15 mg an hour',
      },
      {
        field: 'fourHourLimit',
        severity: 'hard',
        code: 'possible.four-hour.hard-high',
        message: 'The pump could give up to 80 mg in 4 hours (demand 2 mg every 6 min): above the hard maximum of 40 mg in 4 hours',
      },
    ]);
    expect(hasBlockingFinding(findings)).toBe(true);
  });

  it("is held by the order's own limits, and each window by the other", () => {
    const r: Regimen = { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 2, lockoutMinutes: 6, basalRatePerHour: 0, fourHourLimit: 12 };
    // Any hour ≤ the 4-hour limit (12 mg): over the 1-hour soft maximum only, needs a reason.
    expect(codes(checkOrder(r, cedar, adult))).toEqual(['oneHourLimit:possible.one-hour.soft-high']);
    expect(codes(checkOrder({ ...r, oneHourLimit: 8, fourHourLimit: null }, cedar, adult))).toEqual([
      // 4 × 8 = 32 mg in 4 hours: over the 30 mg soft maximum.
      'fourHourLimit:possible.four-hour.soft-high',
    ]);
  });

  it('counts the loading dose in the first hour and a clinician bolus in every window', () => {
    const r: Regimen = { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 1, lockoutMinutes: 10, basalRatePerHour: 0, fourHourLimit: 30 };
    expect(checkOrder(r, cedar, adult)).toEqual([]); // 6 mg an hour, 24 mg in 4 hours
    const findings = checkOrder({ ...r, loadingDose: 3, clinicianBolusDose: 2 }, cedar, adult);
    expect(findings.map((f) => f.message)).toEqual([
      'The pump could give up to 11 mg in the first hour (loading dose 3 mg, demand 1 mg every 10 min, one clinician bolus of 2 mg): above the soft maximum of 10 mg an hour',
    ]);
  });

  it('blocks the 24.5 kg child whose possible 4-hour dose is 11.76 mg against 0.4 mg/kg (9.8 mg)', () => {
    // The demo Wren library's per-kg morphine rule (invented demo values): 4-hour hard 0.4 mg/kg.
    // 0.49 mg × ceil(240 ÷ 10) = 11.76 mg = 0.48 mg/kg. Written wrong before: no findings.
    const wren: LimitRule = {
      doseUnit: 'mg',
      perKg: true,
      limits: { oneHourLimit: { softMax: 0.1, hardMax: 0.12 }, fourHourLimit: { softMax: 0.3, hardMax: 0.4 } },
    };
    const r: Regimen = { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 0.49, lockoutMinutes: 10, basalRatePerHour: 0 };
    const findings = checkOrder(r, wren, { ...child20kg, weightKg: 24.5 }).filter((f) => f.code.startsWith('possible.'));
    expect(findings.map((f) => [f.field, f.severity, f.message])).toEqual([
      [
        'fourHourLimit',
        'hard',
        'The pump could give up to 11.76 mg (0.48 mg/kg for 24.5 kg) in 4 hours (demand 0.49 mg every 10 min): above the hard maximum of 0.4 mg/kg (9.8 mg for this weight) in 4 hours',
      ],
      [
        'oneHourLimit',
        'soft',
        'The pump could give up to 2.94 mg (0.12 mg/kg for 24.5 kg) in an hour (demand 0.49 mg every 10 min): above the soft maximum of 0.1 mg/kg (2.45 mg for this weight) an hour',
      ],
    ]);
  });

  it("property: a possible total over the rule's hard maximum always blocks", () => {
    const typed = fc.integer({ min: 0, max: 5_000 }).map((n) => n / 100);
    fc.assert(
      fc.property(
        typed,
        fc.integer({ min: 1, max: 60 }),
        typed,
        fc.option(typed, { nil: null }),
        (demandDose, lockoutMinutes, basal, bolus) => {
          const r: Regimen = {
            doseUnit: 'mg',
            concentrationPerMl: 1,
            demandDose,
            lockoutMinutes,
            basalRatePerHour: basal,
            clinicianBolusDose: bolus,
          };
          const hourly = basal + demandDose * Math.ceil(60 / lockoutMinutes) + (bolus ?? 0);
          const findings = checkOrder(
            r,
            { doseUnit: 'mg', perKg: false, limits: { oneHourLimit: { hardMax: 15 } } },
            { opioidTolerant: true },
          );
          if (hourly > 15 + 1e-9) expect(hasBlockingFinding(findings)).toBe(true);
        },
      ),
    );
  });
});
