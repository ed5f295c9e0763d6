import { describe, expect, it } from 'vitest';
import { DEFAULT_WARD_POLICY, type ObservationResponse, type VitalsPatient } from '@lockstep/shared';
import { emptyObservationForm, type ObservationFormValues } from './observation-form';
import {
  fieldWarnings,
  findingsHeadline,
  observationFindings,
  type ObservationWarningContext,
  vitalsPatientFor,
} from './observation-warnings';

const NOW = new Date('2026-03-03T14:00:00.000Z');

function observation(at: string, attempts: number, delivered: number, volumeInfusedMl: number): ObservationResponse {
  return {
    id: 1,
    orderId: 1,
    releaseId: 8,
    at,
    painScore: 3,
    sedationLevel: '1',
    respiratoryRate: 14,
    spo2: 96,
    attempts,
    delivered,
    volumeInfusedMl,
    syringeRemainingMl: 40,
    note: '',
    oxygenLitresPerMinute: 0,
    oxygenDevice: null,
    heartRate: null,
    systolicBp: null,
    temperatureC: null,
    consciousness: null,
    news2: null,
    news2NotScored: null,
    recordedByName: 'Kai Mendes',
  };
}

const ADULT: VitalsPatient = { ageYears: 54, paediatricWard: false, spo2Scale: '1' };

// Morphine 1 mg/mL, 1 mg demand dose, lockout 10 min, no basal, 4-hour limit 30 mg; the first syringe,
// started at 12:00, read at 13:00 (4 attempts, 3 delivered, 3 mL).
function context(patient: VitalsPatient = ADULT, flags: ObservationWarningContext['order']['flags'] = []): ObservationWarningContext {
  return {
    order: {
      doseUnit: 'mg',
      demandDose: 1,
      lockoutMinutes: 10,
      basalRatePerHour: 0,
      concentrationPerMl: 1,
      oneHourLimit: null,
      fourHourLimit: 30,
      startedAt: '2026-03-03T12:00:00.000Z',
      releases: [{ id: 8, status: 'in_use', volumeMl: 50 }],
      flags,
    },
    observations: [observation('2026-03-03T13:00:00.000Z', 4, 3, 3)],
    policy: DEFAULT_WARD_POLICY,
    patient,
    now: NOW,
  };
}

/** A calm, complete reading at 14:00: 2 more presses, 2 more doses, 2 mL more. */
const CALM: ObservationFormValues = {
  ...emptyObservationForm(),
  sedationLevel: '1',
  respiratoryRate: 16,
  spo2: 97,
  oxygenLitresPerMinute: 0,
  painScore: 3,
  attempts: 6,
  delivered: 5,
  volumeInfusedMl: 5,
  syringeRemainingMl: 45,
};

const codes = (values: Partial<ObservationFormValues>, ctx = context()) =>
  observationFindings({ ...CALM, ...values }, ctx).map((finding) => `${finding.severity} ${finding.code}`);

describe('observationFindings: what saving raises, by the shared flags', () => {
  it('a calm reading raises nothing', () => {
    expect(codes({})).toEqual([]);
  });

  // NEWS2 (Royal College of Physicians, National Early Warning Score (NEWS) 2, 2017): respiratory rate
  // 8 or below scores 3 (urgent), 9–11 scores 1 (review).
  it('respiratory rate: 8/min urgent, 9–11/min review, 12/min nothing (RCP, NEWS2, 2017)', () => {
    expect(codes({ respiratoryRate: 8 })).toEqual(['urgent respiratory-rate.low']);
    expect(codes({ respiratoryRate: 9 })).toEqual(['review respiratory-rate.review']);
    expect(codes({ respiratoryRate: 11 })).toEqual(['review respiratory-rate.review']);
    expect(codes({ respiratoryRate: 12 })).toEqual([]);
  });

  // NEWS2 SpO2 scale 1: 91 % or below scores 3, 92–93 % scores 2; scale 2 (confirmed hypercapnic
  // respiratory failure): 83 % or below scores 3, 84–87 % review (RCP, NEWS2, 2017).
  it('SpO2 on air: scale 1 91 % urgent, 92–93 % review; scale 2 83 % urgent, 84–87 % review (RCP, NEWS2, 2017)', () => {
    expect(codes({ spo2: 91 })).toEqual(['urgent spo2.low']);
    expect(codes({ spo2: 93 })).toEqual(['review spo2.review']);
    expect(codes({ spo2: 94 })).toEqual([]);
    const scale2 = context({ ...ADULT, spo2Scale: '2' });
    expect(codes({ spo2: 83 }, scale2)).toEqual(['urgent spo2.low']);
    expect(codes({ spo2: 87 }, scale2)).toEqual(['review spo2.review']);
    expect(codes({ spo2: 88 }, scale2)).toEqual([]);
  });

  // Pasero Opioid-induced Sedation Scale: 3 is frequently drowsy, drifts off mid-conversation; stop or
  // reduce the opioid (Pasero C, 1994) [from memory for the wording].
  it('sedation 3 and 4 are urgent, beside the field with the scale’s action', () => {
    for (const sedationLevel of ['3', '4']) {
      const warned = fieldWarnings(observationFindings({ ...CALM, sedationLevel }, context())).sedationLevel;
      expect(warned?.severity).toBe('urgent');
      expect(warned?.action).toMatch(sedationLevel === '3' ? /reduce the opioid dose by 25–50 % or notify the prescriber/ : /naloxone/i);
    }
    expect(codes({ sedationLevel: '2' })).toEqual([]);
  });

  it('sedation 3 is urgent with the scale’s action, and the pain flag then says not to increase the opioid', () => {
    const findings = observationFindings(
      { ...CALM, sedationLevel: '3', painScore: 9, attempts: 4, delivered: 3, volumeInfusedMl: 3 },
      context(),
    );
    expect(findings.map((f) => `${f.severity} ${f.code}`)).toEqual(['urgent sedation.3', 'review pain.no-presses']);
    expect(findings[1]?.action).toMatch(/^Do not increase the opioid/);
  });

  // Pain 9 or more with no presses: check the patient can use the handset (Lockstep's threshold, common practice).
  it('pain 9 with no presses since the last reading: review, check the handset', () => {
    const findings = observationFindings({ ...CALM, painScore: 9, attempts: 4, delivered: 3, volumeInfusedMl: 3 }, context());
    expect(findings).toEqual([expect.objectContaining({ severity: 'review', code: 'pain.no-presses' })]);
    expect(findings[0]?.action).toMatch(/handset/);
  });

  it('urgent findings come before review ones', () => {
    expect(codes({ respiratoryRate: 10, spo2: 91 })).toEqual(['urgent spo2.low', 'review respiratory-rate.review']);
  });

  it('says each breathing finding as soon as its value is typed, before the rest of the form', () => {
    const typing = { ...emptyObservationForm(), respiratoryRate: 10 };
    expect(observationFindings(typing, context()).map((f) => f.code)).toEqual(['respiratory-rate.review']);
    expect(observationFindings({ ...emptyObservationForm(), spo2: 92 }, context()).map((f) => f.code)).toEqual(['spo2.review']);
    // A value out of its plausible range is the form's error, not a finding.
    expect(observationFindings({ ...emptyObservationForm(), spo2: 120 }, context())).toEqual([]);
  });

  it('pump findings wait for every pump value; delivered beyond the lockout is urgent', () => {
    // 12 doses in 60 minutes; a 10-minute lockout allows at most 7 (floor(60 / 10) + 1).
    expect(codes({ attempts: 16, delivered: 15, volumeInfusedMl: 15, syringeRemainingMl: 35 })).toEqual(['urgent delivery.over-regimen']);
    expect(codes({ attempts: 16, delivered: 15, volumeInfusedMl: 15, syringeRemainingMl: '' })).toEqual([]);
  });

  it('never foresees a volume mismatch (boluses given between readings are known only to the server)', () => {
    expect(codes({ volumeInfusedMl: 9, syringeRemainingMl: 41 })).toEqual([]);
  });

  it('an open urgent breathing flag makes the pain flag say not to increase the opioid', () => {
    const open = [
      { severity: 'urgent' as const, code: 'respiratory-rate.low', raisedAt: '2026-03-03T13:00:05.000Z', acknowledgedAt: null },
    ];
    const findings = observationFindings({ ...CALM, painScore: 9, attempts: 4, delivered: 3, volumeInfusedMl: 3 }, context(ADULT, open));
    expect(findings[0]?.action).toMatch(/^Do not increase the opioid/);
  });
});

describe('the two tiers are worded apart', () => {
  it('each field gets its most severe finding, with its tier', () => {
    const findings = observationFindings({ ...CALM, respiratoryRate: 10, spo2: 91 }, context());
    expect(fieldWarnings(findings)).toEqual({
      spo2: expect.objectContaining({ severity: 'urgent', text: expect.stringMatching(/^SpO2 91 %/) }),
      respiratoryRate: expect.objectContaining({ severity: 'review', text: expect.stringMatching(/^Respiratory rate 10\/min/) }),
    });
  });

  it('the headlines say urgent and act now, or review', () => {
    expect(findingsHeadline('urgent', 2)).toBe('Urgent: saving raises 2 urgent flags. Act now, do not wait for the save');
    expect(findingsHeadline('review', 1)).toBe('Review: saving raises 1 review flag');
  });
});

describe('vitalsPatientFor', () => {
  it('reads the age at the time, the ward’s population and the scale, as the server does', () => {
    expect(vitalsPatientFor({ dateOfBirth: '2016-03-04', spo2Scale: '1' }, { population: 'paediatric' }, NOW)).toEqual({
      ageYears: 9,
      paediatricWard: true,
      spo2Scale: '1',
    });
    expect(vitalsPatientFor({ dateOfBirth: '1970-01-01', spo2Scale: '2' }, { population: 'adult' }, NOW).spo2Scale).toBe('2');
  });
});
