import { describe, expect, it } from 'vitest';
import { isSedationOrBreathingFlag, observationFlags, syringeStartReading, type ObservationValues } from './observation-flags.js';
import { DEFAULT_WARD_POLICY } from './ward-policy.js';

const startedAt = '2026-12-02T10:00:00.000Z';
const first: ObservationValues = {
  at: '2026-12-02T10:03:00.000Z',
  painScore: 3,
  sedationLevel: '1',
  respiratoryRate: 14,
  spo2: 97,
  attempts: 1,
  delivered: 1,
  volumeInfusedMl: 1,
  syringeRemainingMl: 49,
};
const regimen = {
  doseUnit: 'mg',
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  concentrationPerMl: 1,
  oneHourLimit: null,
  fourHourLimit: 30,
};
const codes = (flags: { code: string; severity: string }[]) => flags.map((f) => `${f.severity}:${f.code}`);

describe('observationFlags with the syringe start and the regimen', () => {
  it('the syringe start (0 delivered, 0 mL) stands in as the previous reading: a first reading is checked', () => {
    expect(syringeStartReading(startedAt)).toEqual({ at: startedAt, attempts: 0, delivered: 0, volumeInfusedMl: 0 });
    const start = syringeStartReading(startedAt);
    expect(observationFlags(first, start, 0, DEFAULT_WARD_POLICY, { regimen, syringeVolumeMl: 50 })).toEqual([]);
    // 1 mg/h basal at 1 mg/mL with 1 mL left: empty within the ward's 2 hours ([practice], DEFAULT_WARD_POLICY).
    const low = observationFlags(
      { ...first, attempts: 0, delivered: 0, volumeInfusedMl: 0, syringeRemainingMl: 1 },
      start,
      1,
      DEFAULT_WARD_POLICY,
    );
    expect(codes(low)).toContain('review:syringe.low');
  });

  it('40 doses 3 minutes after the start (lockout 10 min, 4-hour limit 30 mg) is urgent', () => {
    const flags = observationFlags(
      { ...first, attempts: 40, delivered: 40, volumeInfusedMl: 40, syringeRemainingMl: 10 },
      syringeStartReading(startedAt),
      0,
      DEFAULT_WARD_POLICY,
      {
        regimen,
      },
    );
    expect(codes(flags)).toEqual(['urgent:delivery.over-regimen']);
  });

  // Sedation-scale actions (Pasero C, 1994; Pasero & McCaffery, 2011) [from memory for the wording]: never increase at 3.
  it('pain beside sedation 3, or while an urgent breathing flag is open, says do not increase the opioid', () => {
    const painful = { ...first, painScore: 8, attempts: 6, delivered: 1 };
    const start = syringeStartReading(startedAt);
    const sedated = observationFlags({ ...painful, sedationLevel: '3' }, start, 0, DEFAULT_WARD_POLICY);
    expect(sedated.find((f) => f.code === 'pain.not-controlled')?.action).toMatch(/^Do not increase the opioid/);
    const open = observationFlags(painful, start, 0, DEFAULT_WARD_POLICY, { urgentBreathingOpen: true });
    expect(open.find((f) => f.code === 'pain.not-controlled')?.action).toMatch(/^Do not increase the opioid/);
    const calm = observationFlags(painful, start, 0, DEFAULT_WARD_POLICY);
    expect(calm.find((f) => f.code === 'pain.not-controlled')?.action).toMatch(/^Review the regimen/);
  });

  it('counts sedation, breathing, NEWS2 and consciousness flags as the concern, not pain or the syringe', () => {
    for (const code of ['sedation.3', 'respiratory-rate.low', 'spo2.low', 'news2.urgent', 'consciousness.not-alert'])
      expect(isSedationOrBreathingFlag(code)).toBe(true);
    for (const code of ['pain.not-controlled', 'syringe.low', 'delivery.over-regimen']) expect(isSedationOrBreathingFlag(code)).toBe(false);
  });
});
