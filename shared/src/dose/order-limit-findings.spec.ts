import { describe, expect, it } from 'vitest';
import { limitFindings } from './order-limit-findings.js';
import type { LimitRule, Regimen } from './types.js';

const matched = { weightKg: null, doseUnitMatches: true };

// Typical ranges, common practice (docs/clinical-sources.md, "Typical ranges"; no single published table): morphine 1 mg/mL, demand
// 0.5–2 mg, lockout 5–10 min, 4-hour limit 30 mg. Used as soft limits; the hard limits are
// illustrative, not published.
const morphineRule: LimitRule = {
  doseUnit: 'mg',
  perKg: false,
  limits: {
    demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 4 },
    lockoutMinutes: { hardMin: 4, softMin: 5, softMax: 10, hardMax: 30 },
    fourHourLimit: { softMax: 30 },
  },
};

// A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: morphine 1 mg demand, lockout 10 minutes.
const ashpMorphine: Regimen = {
  doseUnit: 'mg',
  concentrationPerMl: 1,
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  fourHourLimit: 30,
};

describe('limitFindings', () => {
  it('finds nothing for the common starting regimen within the typical ranges', () => {
    expect(limitFindings(ashpMorphine, morphineRule, 'mg', matched)).toEqual([]);
  });

  it('gives hard and soft findings with plain messages in the field unit', () => {
    const r = { ...ashpMorphine, demandDose: 10, lockoutMinutes: 4.5, fourHourLimit: 40 };
    expect(limitFindings(r, morphineRule, 'mg', matched)).toEqual([
      { field: 'demandDose', severity: 'hard', code: 'limit.hard-high', message: 'Demand dose 10 mg is above the hard maximum 4 mg' },
      { field: 'lockoutMinutes', severity: 'soft', code: 'limit.soft-low', message: 'Lockout 4.5 min is below the soft minimum 5 min' },
      { field: 'fourHourLimit', severity: 'soft', code: 'limit.soft-high', message: '4-hour limit 40 mg is above the soft maximum 30 mg' },
    ]);
  });

  it('says "just above" when the value and the limit print the same at 3 decimals', () => {
    const rule: LimitRule = { perKg: true, limits: { demandDose: { hardMax: 20 } } };
    const mcg = { ...ashpMorphine, doseUnit: 'mcg' as const, demandDose: 400.002 };
    const [finding] = limitFindings(mcg, rule, 'mcg', { weightKg: 20, doseUnitMatches: true });
    expect(finding.message).toBe('Demand dose is just above the hard maximum 20 mcg/kg');
  });

  it('shows a sub-milligram value in mcg where mg would lose digits, and the limit to its full precision', () => {
    // ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations: mcg below 1 mg.
    // Written wrong before: 0.02001 mg/kg printed as 0.02 mg/kg, the same as the limit.
    const rule: LimitRule = { perKg: true, limits: { demandDose: { hardMax: 0.02 }, loadingDose: { hardMax: 0.0125 } } };
    const findings = limitFindings({ ...ashpMorphine, demandDose: 0.4002, loadingDose: 0.3 }, rule, 'mg', {
      weightKg: 20,
      doseUnitMatches: true,
    });
    expect(findings.map((f) => f.message)).toEqual([
      'Loading dose 0.015 mg/kg is above the hard maximum 0.0125 mg/kg',
      'Demand dose 20.01 mcg/kg is above the hard maximum 0.02 mg/kg',
    ]);
  });

  it('skips dose fields when the dose unit does not match, but still checks the lockout', () => {
    const r = { ...ashpMorphine, demandDose: 10, lockoutMinutes: 2 };
    const findings = limitFindings(r, morphineRule, 'mg', { weightKg: null, doseUnitMatches: false });
    expect(findings.map((f) => f.field)).toEqual(['lockoutMinutes']);
  });

  it('skips fields whose value is absent or unusable', () => {
    const r = { ...ashpMorphine, demandDose: Number.NaN, fourHourLimit: null };
    expect(limitFindings(r, morphineRule, 'mg', matched)).toEqual([]);
  });

  it('uses the basal rate unit for basal limits', () => {
    const rule: LimitRule = { perKg: true, limits: { basalRatePerHour: { softMax: 4 } } };
    const r: Regimen = { ...ashpMorphine, doseUnit: 'mcg', concentrationPerMl: 20, basalRatePerHour: 100 };
    const [finding] = limitFindings(r, rule, 'mcg', { weightKg: 20, doseUnitMatches: true });
    expect(finding.message).toBe('Basal rate 5 mcg/kg/h is above the soft maximum 4 mcg/kg/h');
  });
});
