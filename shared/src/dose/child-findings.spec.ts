import { describe, expect, it } from 'vitest';
import { childFindings, ruleCeiling } from './child-findings.js';
import type { LimitRule, OrderCheckContext, PatientFactors, Regimen } from './types.js';

// Demo paediatric morphine rule (invented limits); the per-kg demand band follows the Association
// of Paediatric Anaesthetists of Great Britain and Ireland, Good Practice in Postoperative and
// Procedural Pain Management (morphine PCA bolus 10–20 mcg/kg). The ceilings are invented.
const perKgRule: LimitRule = {
  doseUnit: 'mg',
  perKg: true,
  limits: {
    demandDose: { softMin: 0.01, softMax: 0.02, hardMax: 0.03, ceiling: 1 },
    lockoutMinutes: { hardMin: 5, hardMax: 20 },
    basalRatePerHour: { softMax: 0.004, hardMax: 0.01, ceiling: 0.5 },
    fourHourLimit: { softMax: 0.3, hardMax: 0.4 },
  },
};
const adultRule: LimitRule = { doseUnit: 'mg', perKg: false, limits: { demandDose: { hardMax: 3 } } };
const regimen: Regimen = { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 0.4, lockoutMinutes: 10, basalRatePerHour: 0 };
// An 8-year-old boy of 24.5 kg, weighed two days ago.
const child: PatientFactors = {
  opioidTolerant: false,
  ageYears: 8,
  ageMonths: 99,
  sex: 'male',
  weightKg: 24.5,
  weightMeasuredOn: '2026-12-01',
};
const context: OrderCheckContext = { today: '2026-12-03', weightMaxAgeDays: 7 };
const codes = (findings: { code: string; severity: string }[]) => findings.map((f) => [f.code, f.severity]);

describe('childFindings: absolute ceilings of per-kg rules', () => {
  it('passes doses at or under the ceiling', () => {
    expect(childFindings({ ...regimen, demandDose: 1 }, perKgRule, child, context)).toEqual([]);
  });

  it('blocks a dose above the ceiling whatever the weight', () => {
    // 0.03 mg/kg × 40 kg = 1.2 mg: inside the per-kg limit, above the 1 mg ceiling.
    const findings = childFindings(
      { ...regimen, demandDose: 1.2 },
      perKgRule,
      { ...child, weightKg: 40, ageMonths: 150, ageYears: 12 },
      context,
    );
    expect(findings).toEqual([expect.objectContaining({ field: 'demandDose', severity: 'hard', code: 'limit.ceiling' })]);
    expect(findings[0].message).toBe("Demand dose 1.2 mg is above the rule's absolute ceiling 1 mg, whatever the weight");
    expect(codes(childFindings({ ...regimen, basalRatePerHour: 0.6 }, perKgRule, child, context))).toEqual([['limit.ceiling', 'hard']]);
  });

  it('blocks what the pump could give in an hour or 4 hours above the ceiling of the 1-hour or 4-hour limit', () => {
    const withWindowCeilings: LimitRule = {
      ...perKgRule,
      limits: {
        ...perKgRule.limits,
        oneHourLimit: { hardMax: 0.12, ceiling: 6 },
        fourHourLimit: { softMax: 0.3, hardMax: 0.4, ceiling: 20 },
      },
    };
    // 1 mg every 5 minutes: 12 mg an hour (over 6 mg), 48 mg in 4 hours held by the 18 mg 4-hour limit (under 20 mg).
    const heavy: PatientFactors = { ...child, ageYears: 16, ageMonths: 195, weightKg: 80 };
    const findings = childFindings({ ...regimen, demandDose: 1, lockoutMinutes: 5, fourHourLimit: 18 }, withWindowCeilings, heavy, context);
    expect(findings.map((f) => [f.field, f.code, f.severity])).toEqual([['oneHourLimit', 'possible.ceiling', 'hard']]);
    expect(findings[0].message).toBe(
      "First hour: the pump could give 12 mg, above the rule's absolute ceiling 6 mg for the 1-hour limit, whatever the weight",
    );
    // Said once, at the field, when the order's own 1-hour limit is itself over the ceiling.
    const own = childFindings(
      { ...regimen, demandDose: 1, lockoutMinutes: 5, oneHourLimit: 8, fourHourLimit: 18 },
      withWindowCeilings,
      heavy,
      context,
    );
    expect(own.map((f) => [f.field, f.code])).toEqual([['oneHourLimit', 'limit.ceiling']]);
  });

  it('says when a per-kg rule limits a dose field without a ceiling (never silently no limit)', () => {
    expect(codes(childFindings({ ...regimen, fourHourLimit: 8 }, perKgRule, child, context))).toEqual([['limit.no-ceiling', 'caution']]);
  });

  it('reads the ceiling only from per-kg rules', () => {
    expect(ruleCeiling(perKgRule, 'demandDose')).toBe(1);
    expect(ruleCeiling(perKgRule, 'fourHourLimit')).toBeNull();
    expect(ruleCeiling({ ...perKgRule, perKg: false }, 'demandDose')).toBeNull();
  });
});

describe('childFindings: weight plausibility (CDC 2000 weight-for-age, beyond ±3 z, common practice)', () => {
  it('asks to check the weight of a 7-year-old typed in pounds or with a decimal slip', () => {
    const seven: PatientFactors = { ...child, ageYears: 7, ageMonths: 84 };
    // CDC 2000 wtage.csv, boys Agemos 84.5: median 23.2 kg; 23 kg typed as 50.7 "kg".
    const pounds = childFindings(regimen, adultRule, { ...seven, weightKg: 50.7 }, context);
    expect(codes(pounds)).toEqual([['weight.implausible', 'soft']]);
    expect(pounds[0].message).toMatch(/^Check the weight: 50.7 kg is unusual for a 7-year-old boy \(/);
    expect(codes(childFindings(regimen, adultRule, { ...seven, weightKg: 2.3 }, context))).toEqual([['weight.implausible', 'soft']]);
    expect(childFindings(regimen, adultRule, { ...seven, weightKg: 23 }, context)).toEqual([]);
  });

  it('checks a toddler against the WHO standard, and says when the age is not known instead of calling the weight plausible', () => {
    // WHO weight-for-age, boys month 15: median 10.3 kg.
    const toddler: PatientFactors = { ...child, ageYears: 1, ageMonths: 14, weightKg: 10 };
    expect(childFindings(regimen, adultRule, toddler, context)).toEqual([]);
    const pounds = childFindings(regimen, adultRule, { ...toddler, weightKg: 22 }, context);
    expect(codes(pounds)).toEqual([['weight.implausible', 'soft']]);
    expect(pounds[0].message).toContain('WHO Child Growth Standards weight-for-age');
    expect(codes(childFindings(regimen, adultRule, { ...toddler, ageMonths: null }, context))).toEqual([['weight.not-checked', 'caution']]);
  });

  it('does not check adults against a children’s reference', () => {
    expect(childFindings(regimen, adultRule, { ...child, ageYears: 40, ageMonths: 480, weightKg: 150 }, context)).toEqual([]);
  });
});

describe('childFindings: weight age (the ward’s weightMaxAgeDays; default 7 days, common practice)', () => {
  it('cautions when the weight is older than the ward allows', () => {
    const old = childFindings(regimen, perKgRule, { ...child, weightMeasuredOn: '2026-11-20' }, context);
    expect(codes(old)).toEqual([['weight.old', 'caution']]);
    expect(old[0].message).toBe(
      'The weight was measured 13 days ago (2026-11-20); this ward asks for one at most 7 days old: weigh the patient',
    );
    expect(childFindings(regimen, perKgRule, { ...child, weightMeasuredOn: '2026-11-26' }, context)).toEqual([]);
  });

  it('cautions when the weight has no measured date, or one after today', () => {
    expect(codes(childFindings(regimen, perKgRule, { ...child, weightMeasuredOn: null }, context))).toEqual([
      ['weight.undated', 'caution'],
    ]);
    expect(codes(childFindings(regimen, perKgRule, { ...child, weightMeasuredOn: '2026-12-05' }, context))).toEqual([
      ['weight.future-date', 'caution'],
    ]);
  });

  it('checks the weight age of an adult only when the rule is per kg', () => {
    const adult: PatientFactors = { ...child, ageYears: 40, ageMonths: 480, weightKg: 70, weightMeasuredOn: null };
    expect(childFindings(regimen, adultRule, adult, context)).toEqual([]);
    expect(codes(childFindings(regimen, perKgRule, adult, context))).toEqual([['weight.undated', 'caution']]);
  });

  it('leaves a missing weight to the weight error of per-kg rules', () => {
    expect(childFindings(regimen, perKgRule, { ...child, weightKg: null }, context)).toEqual([]);
  });
});
