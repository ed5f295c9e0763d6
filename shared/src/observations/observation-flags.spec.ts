import { describe, expect, it } from 'vitest';
import { observationFlags, type ObservationValues } from './observation-flags.js';
import { DEFAULT_WARD_POLICY } from './ward-policy.js';

const calm: ObservationValues = {
  at: '2026-12-02T10:00:00Z',
  painScore: 3,
  sedationLevel: '1',
  respiratoryRate: 14,
  spo2: 97,
  attempts: 10,
  delivered: 8,
  volumeInfusedMl: 8,
  syringeRemainingMl: 42,
};
const codes = (flags: { code: string; severity: string }[]) => flags.map((f) => `${f.severity}:${f.code}`);

describe('observationFlags', () => {
  it('raises nothing for acceptable values (POSS S, 1 and 2 are acceptable: Pasero & McCaffery, 2011)', () => {
    for (const level of ['S', '1', '2'] as const)
      expect(observationFlags({ ...calm, sedationLevel: level }, null, 0, DEFAULT_WARD_POLICY)).toEqual([]);
  });

  it('sedation 3 is urgent, with the scale’s action to reduce the dose 25–50 % or call the prescriber (Pasero & McCaffery, 2011)', () => {
    const [flag] = observationFlags({ ...calm, sedationLevel: '3' }, null, 0, DEFAULT_WARD_POLICY);
    expect(flag).toMatchObject({ severity: 'urgent', code: 'sedation.3' });
    expect(flag.action).toContain('25–50 %');
  });

  it('sedation 4 is urgent: stop the opioid, stay, call for help, consider naloxone (Pasero & McCaffery, 2011)', () => {
    const [flag] = observationFlags({ ...calm, sedationLevel: '4' }, null, 0, DEFAULT_WARD_POLICY);
    expect(flag.action).toMatch(/stop the opioid.*stay with the patient.*naloxone/);
  });

  it('respiratory rate 8/min or below and SpO2 91 % or below are urgent by default (NEWS2, Royal College of Physicians 2017); 9/min and 92 % are for review, not urgent', () => {
    expect(codes(observationFlags({ ...calm, respiratoryRate: 8, spo2: 91 }, null, 0, DEFAULT_WARD_POLICY))).toEqual([
      'urgent:respiratory-rate.low',
      'urgent:spo2.low',
    ]);
    expect(codes(observationFlags({ ...calm, respiratoryRate: 9, spo2: 92 }, null, 0, DEFAULT_WARD_POLICY))).toEqual([
      'review:respiratory-rate.review',
      'review:spo2.review',
    ]);
  });

  it('pain ≥ 7 with two or more attempts per delivered dose since the last observation needs review [practice]', () => {
    const later = {
      ...calm,
      at: '2026-12-02T11:00:00Z',
      painScore: 8,
      attempts: 22,
      delivered: 12,
      volumeInfusedMl: 12,
      syringeRemainingMl: 38,
    };
    expect(codes(observationFlags(later, calm, 0, DEFAULT_WARD_POLICY))).toEqual(['review:pain.not-controlled']);
    expect(observationFlags({ ...later, attempts: 17 }, calm, 0, DEFAULT_WARD_POLICY)).toEqual([]);
  });

  it('projects the syringe empty from basal plus recent demand use (worked example)', () => {
    // 1 mL/h basal + 4 mL in the last hour of which 1 mL was basal → 3 mL/h demand; 7 mL left → 7 ÷ 4 = 1.75 h.
    const later = { ...calm, at: '2026-12-02T11:00:00Z', volumeInfusedMl: 12, syringeRemainingMl: 7 };
    const [flag] = observationFlags(later, calm, 1, DEFAULT_WARD_POLICY);
    expect(flag).toMatchObject({ severity: 'review', code: 'syringe.low' });
    expect(flag.message).toContain('1.75 h');
    expect(observationFlags({ ...later, syringeRemainingMl: 9 }, calm, 1, DEFAULT_WARD_POLICY)).toEqual([]);
  });
});
