import { describe, expect, it } from 'vitest';
import type { SyringeReading } from '../observations/usage-summary.js';
import { bolusLimitRefusal, bolusSafetyRefusal, givenInWindow, type BolusLimitRegimen } from './bolus-checks.js';

// Sedation: Pasero Opioid-induced Sedation Scale (POSS), Pasero C, 1994; Pasero & McCaffery, Pain
// Assessment and Pharmacologic Management, 2011 — S, 1 and 2 acceptable; 3 and 4 unacceptable
// (reduce or stop the opioid and tell the prescriber).
describe('bolusSafetyRefusal', () => {
  it('allows a bolus at sedation S, 1 and 2 (POSS, Pasero 1994; Pasero & McCaffery 2011) and with no observation yet', () => {
    for (const level of ['S', '1', '2'] as const) expect(bolusSafetyRefusal({ lastSedation: level, openUrgentFlagCodes: [] })).toBeNull();
    expect(bolusSafetyRefusal({ lastSedation: null, openUrgentFlagCodes: [] })).toBeNull();
  });

  it('refuses at sedation 3 and 4 with "contact the prescriber" (POSS, Pasero 1994; Pasero & McCaffery 2011)', () => {
    for (const level of ['3', '4'] as const) {
      const refusal = bolusSafetyRefusal({ lastSedation: level, openUrgentFlagCodes: [] });
      expect(refusal).toContain(`sedation ${level}`);
      expect(refusal).toMatch(/contact the prescriber/i);
    }
  });

  it('refuses while an urgent breathing flag is open, not for other urgent flags', () => {
    const refusal = bolusSafetyRefusal({ lastSedation: '1', openUrgentFlagCodes: ['respiratory-rate.low'] });
    expect(refusal).toContain('respiratory-rate.low');
    expect(refusal).toMatch(/contact the prescriber/i);
    expect(bolusSafetyRefusal({ lastSedation: '1', openUrgentFlagCodes: ['spo2.low'] })).toMatch(/breathing/);
    expect(bolusSafetyRefusal({ lastSedation: '1', openUrgentFlagCodes: ['delivery.over-regimen', 'syringe.low'] })).toBeNull();
  });
});

// Worked example (arithmetic by definition): morphine, demand dose 1 mg, basal 0.5 mg/h, 1-hour
// limit 4 mg, 4-hour limit 10 mg; syringe started 06:00, readings at 07:00 (2 delivered) and 09:00
// (4 delivered); a 1 mg clinician bolus at 08:45; now 09:30.
const regimen: BolusLimitRegimen = {
  doseUnit: 'mg',
  demandDose: 1,
  basalRatePerHour: 0.5,
  oneHourLimit: 4,
  fourHourLimit: 10,
  startedAt: '2026-12-02T06:00:00Z',
};
const readings: SyringeReading[] = [
  { syringeId: 1, at: '2026-12-02T06:00:00Z', attempts: 0, delivered: 0, volumeInfusedMl: 0 },
  { syringeId: 1, at: '2026-12-02T07:00:00Z', attempts: 3, delivered: 2, volumeInfusedMl: 2.5 },
  { syringeId: 1, at: '2026-12-02T09:00:00Z', attempts: 5, delivered: 4, volumeInfusedMl: 6 },
];
const boluses = [{ at: '2026-12-02T08:45:00Z', amount: 1 }];
const now = new Date('2026-12-02T09:30:00Z');

describe('givenInWindow', () => {
  it('adds demand doses by the pump totals, basal over the window and boluses', () => {
    // Last hour: the 09:00 reading's 2 doses (2 mg) + basal 0.5 mg + the 08:45 bolus 1 mg.
    expect(givenInWindow(readings, boluses, regimen, now, 60)).toBe(3.5);
    // Last 4 hours (05:30–09:30): 4 doses (4 mg) + basal from the 06:00 start, 3.5 h (1.75 mg) + 1 mg.
    expect(givenInWindow(readings, boluses, regimen, now, 240)).toBe(6.75);
  });

  it('gives NaN, never a small total, when a counter went backwards', () => {
    const broken = [...readings, { syringeId: 1, at: '2026-12-02T09:15:00Z', attempts: 0, delivered: 0, volumeInfusedMl: 0 }];
    expect(givenInWindow(broken, [], regimen, now, 60)).toBeNaN();
  });
});

describe('bolusLimitRefusal', () => {
  it('allows a bolus that reaches the 1-hour limit exactly and refuses one over it', () => {
    expect(bolusLimitRefusal(0.5, readings, boluses, regimen, now)).toBeNull(); // 3.5 + 0.5 = 4 mg
    const refusal = bolusLimitRefusal(1, readings, boluses, regimen, now); // 3.5 + 1 = 4.5 mg
    expect(refusal).toContain('3.5 mg given in the last hour + this bolus of 1 mg = 4.5 mg, over the 1-hour limit of 4 mg');
    expect(refusal).toMatch(/contact the prescriber/i);
  });

  it('allows a bolus that reaches the 4-hour limit exactly and refuses one over it', () => {
    const wide = { ...regimen, oneHourLimit: null };
    expect(bolusLimitRefusal(3.25, readings, boluses, wide, now)).toBeNull(); // 6.75 + 3.25 = 10 mg
    expect(bolusLimitRefusal(3.5, readings, boluses, wide, now)).toContain('= 10.25 mg, over the 4-hour limit of 10 mg');
  });

  it('has nothing to check with no limits, and refuses when the total cannot be worked out', () => {
    expect(bolusLimitRefusal(50, readings, boluses, { ...regimen, oneHourLimit: null, fourHourLimit: null }, now)).toBeNull();
    expect(bolusLimitRefusal(1, readings, boluses, { ...regimen, oneHourLimit: Number.NaN }, now)).toContain('cannot be worked out');
  });
});
