import { describe, expect, it } from 'vitest';
import { consistencyFindings } from './order-consistency-findings.js';
import type { Regimen } from './types.js';

// A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: morphine 1 mg demand, lockout 10 minutes.
// The limits below are arithmetic on the definitions in docs/design.md, "Order fields and dosing conventions".
const ashpMorphine: Regimen = { doseUnit: 'mg', concentrationPerMl: 1, demandDose: 1, lockoutMinutes: 10, basalRatePerHour: 0 };

describe('consistencyFindings', () => {
  it('accepts a consistent regimen', () => {
    // Morphine 4-hour limit 30 mg: common practice (docs/clinical-sources.md, "Typical ranges").
    expect(consistencyFindings({ ...ashpMorphine, oneHourLimit: 6, fourHourLimit: 30 })).toEqual([]);
  });

  it('needs a lockout of at least 1 minute', () => {
    expect(consistencyFindings({ ...ashpMorphine, lockoutMinutes: 0.5 })).toEqual([
      { field: 'lockoutMinutes', severity: 'error', code: 'lockout.too-short', message: 'Lockout must be at least 1 minute' },
    ]);
    expect(consistencyFindings({ ...ashpMorphine, lockoutMinutes: 1 })).toEqual([]);
  });

  it('needs a 1-hour limit of at least an hour of basal plus one demand dose', () => {
    const findings = consistencyFindings({ ...ashpMorphine, basalRatePerHour: 1, oneHourLimit: 1.5 });
    expect(findings).toEqual([
      {
        field: 'oneHourLimit',
        severity: 'error',
        code: 'consistency.one-hour-limit-below-basal-and-demand',
        message: '1-hour limit 1.5 mg is less than an hour of basal rate plus one demand dose (2 mg)',
      },
    ]);
    expect(consistencyFindings({ ...ashpMorphine, basalRatePerHour: 1, oneHourLimit: 2 })).toEqual([]);
    // 0.1 + 0.2 is 0.30000000000000004 in binary: still exactly at the limit.
    expect(consistencyFindings({ ...ashpMorphine, basalRatePerHour: 0.1, demandDose: 0.2, oneHourLimit: 0.3 })).toEqual([]);
  });

  it('needs a 4-hour limit of at least four hours of basal plus one demand dose', () => {
    // Written wrong before: only four hours of basal were needed, so a 4-hour limit could leave
    // no room for a single demand dose. Arithmetic on the definitions (docs/design.md).
    const findings = consistencyFindings({ ...ashpMorphine, doseUnit: 'mcg', demandDose: 10, basalRatePerHour: 25, fourHourLimit: 105 });
    expect(findings).toEqual([
      {
        field: 'fourHourLimit',
        severity: 'error',
        code: 'consistency.four-hour-limit-below-basal-and-demand',
        message: '4-hour limit 105 mcg is less than four hours of basal rate plus one demand dose (110 mcg)',
      },
    ]);
    expect(consistencyFindings({ ...ashpMorphine, doseUnit: 'mcg', demandDose: 10, basalRatePerHour: 25, fourHourLimit: 110 })).toEqual([]);
    expect(consistencyFindings({ ...ashpMorphine, basalRatePerHour: 0.1, fourHourLimit: 1.4 })).toEqual([]);
  });

  it('needs a 4-hour limit of at least the 1-hour limit (an hour is part of 4 hours: definition)', () => {
    expect(consistencyFindings({ ...ashpMorphine, oneHourLimit: 10, fourHourLimit: 8 })).toEqual([
      {
        field: 'fourHourLimit',
        severity: 'error',
        code: 'consistency.four-hour-limit-below-one-hour-limit',
        message: '4-hour limit 8 mg is less than the 1-hour limit 10 mg',
      },
    ]);
    expect(consistencyFindings({ ...ashpMorphine, oneHourLimit: 10, fourHourLimit: 10 })).toEqual([]);
  });

  it('refuses a demand dose and a basal rate both 0: the pump would give nothing', () => {
    expect(consistencyFindings({ ...ashpMorphine, demandDose: 0 }).map((f) => `${f.field}:${f.code}`)).toEqual([
      'demandDose:consistency.nothing-to-give',
    ]);
    expect(consistencyFindings({ ...ashpMorphine, demandDose: 0, basalRatePerHour: 0.5 })).toEqual([]);
  });

  it('skips checks that need an unusable number', () => {
    expect(consistencyFindings({ ...ashpMorphine, basalRatePerHour: Number.NaN, oneHourLimit: 0, fourHourLimit: 0 })).toEqual([]);
    expect(consistencyFindings({ ...ashpMorphine, lockoutMinutes: -1 })).toEqual([]);
  });
});
