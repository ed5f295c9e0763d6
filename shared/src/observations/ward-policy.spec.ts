import { describe, expect, it } from 'vitest';
import {
  DEFAULT_WARD_POLICY,
  SEDATION_ALWAYS_URGENT_AT,
  WARD_POLICY_FLOORS,
  wardPolicyFloorErrors,
  withWardPolicyFloors,
} from './ward-policy.js';
import { updateWardPolicySchema } from '../wards/wards-requests.schema.js';

describe('ward policy floors', () => {
  // NEWS2 (Royal College of Physicians, National Early Warning Score (NEWS) 2, 2017): RR <= 8 scores 3.
  it('keeps a respiratory rate of 8/min or below urgent on every ward (NEWS2, RCP 2017)', () => {
    expect(WARD_POLICY_FLOORS.respiratoryRateThreshold.min).toBe(9);
    expect(wardPolicyFloorErrors({ respiratoryRateThreshold: 9 })).toEqual({});
    expect(wardPolicyFloorErrors({ respiratoryRateThreshold: 12 })).toEqual({});
    expect(wardPolicyFloorErrors({ respiratoryRateThreshold: 8 })).toEqual({
      respiratoryRateThreshold: WARD_POLICY_FLOORS.respiratoryRateThreshold.message,
    });
    expect(WARD_POLICY_FLOORS.respiratoryRateThreshold.message).toMatch(/8\/min or below is always urgent \(NEWS2/);
  });

  // NEWS2 SpO2 scale 1 (Royal College of Physicians, 2017): SpO2 <= 91 % scores 3.
  it('keeps SpO2 of 91 % or below urgent on every ward (NEWS2 scale 1, RCP 2017)', () => {
    expect(wardPolicyFloorErrors({ spo2Threshold: 92 })).toEqual({});
    expect(wardPolicyFloorErrors({ spo2Threshold: 94 })).toEqual({});
    expect(wardPolicyFloorErrors({ spo2Threshold: 91 })).toEqual({ spo2Threshold: WARD_POLICY_FLOORS.spo2Threshold.message });
    expect(wardPolicyFloorErrors({ spo2Threshold: 70 }).spo2Threshold).toMatch(/91 % or below is always urgent/);
  });

  // Hourly in the first 24 hours and two-hourly afterwards: this product's defaults, common practice.
  it('lets intervals shorten but not lengthen past the stated defaults (common practice)', () => {
    expect(wardPolicyFloorErrors({ observationIntervalFirst24hMinutes: 30, observationIntervalMinutes: 60 })).toEqual({});
    expect(wardPolicyFloorErrors({ observationIntervalFirst24hMinutes: 60, observationIntervalMinutes: 120 })).toEqual({});
    expect(Object.keys(wardPolicyFloorErrors({ observationIntervalFirst24hMinutes: 61, observationIntervalMinutes: 121 })).sort()).toEqual([
      'observationIntervalFirst24hMinutes',
      'observationIntervalMinutes',
    ]);
  });

  // Every 15 minutes at least while close observation runs: common practice; the ASPMN guideline (Jarzyna D
  // et al., Pain Manag Nurs 2011;12(3):118-145) says monitoring intensity follows risk, with no single interval.
  it('keeps close observation at least every 15 minutes (common practice; ASPMN 2011 gives no single interval)', () => {
    expect(WARD_POLICY_FLOORS.closeObservationIntervalMinutes.max).toBe(15);
    expect(wardPolicyFloorErrors({ closeObservationIntervalMinutes: 15 })).toEqual({});
    expect(wardPolicyFloorErrors({ closeObservationIntervalMinutes: 10 })).toEqual({});
    expect(wardPolicyFloorErrors({ closeObservationIntervalMinutes: 16 })).toEqual({
      closeObservationIntervalMinutes: WARD_POLICY_FLOORS.closeObservationIntervalMinutes.message,
    });
    expect(WARD_POLICY_FLOORS.closeObservationIntervalMinutes.message).toMatch(/every 15 minutes \(common practice\)/);
  });

  // At least the first hour of close observation after a start or a dose-raising change: common practice.
  it('keeps close observation for at least an hour (common practice)', () => {
    expect(WARD_POLICY_FLOORS.closeObservationPeriodMinutes.min).toBe(60);
    expect(wardPolicyFloorErrors({ closeObservationPeriodMinutes: 60 })).toEqual({});
    expect(wardPolicyFloorErrors({ closeObservationPeriodMinutes: 90 })).toEqual({});
    expect(wardPolicyFloorErrors({ closeObservationPeriodMinutes: 59 })).toEqual({
      closeObservationPeriodMinutes: WARD_POLICY_FLOORS.closeObservationPeriodMinutes.message,
    });
  });

  // Naloxone wears off before most opioids: at least 2 hours of close observation is common practice, with no
  // single published interval.
  it('keeps close observation for at least 2 hours after naloxone (common practice, no single published interval)', () => {
    expect(WARD_POLICY_FLOORS.naloxoneClosePeriodMinutes.min).toBe(120);
    expect(wardPolicyFloorErrors({ naloxoneClosePeriodMinutes: 120 })).toEqual({});
    expect(wardPolicyFloorErrors({ naloxoneClosePeriodMinutes: 180 })).toEqual({});
    expect(wardPolicyFloorErrors({ naloxoneClosePeriodMinutes: 119 })).toEqual({
      naloxoneClosePeriodMinutes: WARD_POLICY_FLOORS.naloxoneClosePeriodMinutes.message,
    });
    expect(WARD_POLICY_FLOORS.naloxoneClosePeriodMinutes.message).toMatch(/wears off before most opioids/);
  });

  it('never takes a value that is not a finite number as no limit', () => {
    expect(
      Object.keys(wardPolicyFloorErrors({ respiratoryRateThreshold: Number.NaN, observationIntervalMinutes: Infinity })).sort(),
    ).toEqual(['observationIntervalMinutes', 'respiratoryRateThreshold']);
  });

  it('ships defaults inside the floors', () => {
    expect(wardPolicyFloorErrors(DEFAULT_WARD_POLICY)).toEqual({});
    expect(DEFAULT_WARD_POLICY.respiratoryRateThreshold).toBe(9);
    expect(DEFAULT_WARD_POLICY.spo2Threshold).toBe(92);
  });

  it('holds a stored looser value at the floor and leaves a tighter one alone', () => {
    const held = withWardPolicyFloors({
      ...DEFAULT_WARD_POLICY,
      respiratoryRateThreshold: 8,
      spo2Threshold: 90,
      observationIntervalFirst24hMinutes: 240,
      observationIntervalMinutes: 480,
      closeObservationIntervalMinutes: 30,
      closeObservationPeriodMinutes: 30,
      naloxoneClosePeriodMinutes: 60,
    });
    expect(held).toMatchObject({
      respiratoryRateThreshold: 9,
      spo2Threshold: 92,
      observationIntervalFirst24hMinutes: 60,
      observationIntervalMinutes: 120,
      closeObservationIntervalMinutes: 15,
      closeObservationPeriodMinutes: 60,
      naloxoneClosePeriodMinutes: 120,
    });
    const tighter = {
      ...DEFAULT_WARD_POLICY,
      respiratoryRateThreshold: 10,
      spo2Threshold: 94,
      observationIntervalMinutes: 60,
      closeObservationIntervalMinutes: 10,
      closeObservationPeriodMinutes: 90,
      naloxoneClosePeriodMinutes: 180,
    };
    expect(withWardPolicyFloors(tighter)).toEqual(tighter);
  });

  it('holds a stored value that is not a finite number at the floor, never "no limit"', () => {
    const held = withWardPolicyFloors({
      ...DEFAULT_WARD_POLICY,
      respiratoryRateThreshold: Number.NaN,
      closeObservationIntervalMinutes: Infinity,
      closeObservationPeriodMinutes: Number.NaN,
      naloxoneClosePeriodMinutes: -Infinity,
    });
    expect(held).toMatchObject({
      respiratoryRateThreshold: 9,
      closeObservationIntervalMinutes: 15,
      closeObservationPeriodMinutes: 60,
      naloxoneClosePeriodMinutes: 120,
    });
  });

  // POSS (Pasero C, 1994): sedation 3 is unacceptable; no ward setting changes that.
  it('keeps sedation 3 urgent (POSS, Pasero 1994)', () => {
    expect(SEDATION_ALWAYS_URGENT_AT).toBe(3);
  });

  it('the request schema refuses a value past a floor with the floor’s words', () => {
    const result = updateWardPolicySchema.safeParse({ respiratoryRateThreshold: 8, spo2Threshold: 90, observationIntervalMinutes: 240 });
    expect(result.success).toBe(false);
    const messages = Object.fromEntries((result.error?.issues ?? []).map((issue) => [issue.path[0], issue.message]));
    expect(messages).toEqual({
      respiratoryRateThreshold: WARD_POLICY_FLOORS.respiratoryRateThreshold.message,
      spo2Threshold: WARD_POLICY_FLOORS.spo2Threshold.message,
      observationIntervalMinutes: WARD_POLICY_FLOORS.observationIntervalMinutes.message,
    });
    expect(updateWardPolicySchema.safeParse({ respiratoryRateThreshold: 10, spo2Threshold: 94 }).success).toBe(true);
  });

  it('the request schema bounds the close-observation settings, naming the floor where one is passed', () => {
    const messages = (body: object) =>
      Object.fromEntries((updateWardPolicySchema.safeParse(body).error?.issues ?? []).map((issue) => [issue.path[0], issue.message]));
    expect(messages({ closeObservationIntervalMinutes: 5, closeObservationPeriodMinutes: 60, naloxoneClosePeriodMinutes: 120 })).toEqual(
      {},
    );
    expect(messages({ closeObservationIntervalMinutes: 15, closeObservationPeriodMinutes: 240, naloxoneClosePeriodMinutes: 720 })).toEqual(
      {},
    );
    expect(messages({ closeObservationIntervalMinutes: 16, closeObservationPeriodMinutes: 59, naloxoneClosePeriodMinutes: 119 })).toEqual({
      closeObservationIntervalMinutes: WARD_POLICY_FLOORS.closeObservationIntervalMinutes.message,
      closeObservationPeriodMinutes: WARD_POLICY_FLOORS.closeObservationPeriodMinutes.message,
      naloxoneClosePeriodMinutes: WARD_POLICY_FLOORS.naloxoneClosePeriodMinutes.message,
    });
    expect(messages({ closeObservationIntervalMinutes: 4, closeObservationPeriodMinutes: 241, naloxoneClosePeriodMinutes: 721 })).toEqual({
      closeObservationIntervalMinutes: 'At least 5 minutes',
      closeObservationPeriodMinutes: 'At most 240 minutes',
      naloxoneClosePeriodMinutes: 'At most 720 minutes',
    });
    expect(messages({ closeObservationIntervalMinutes: 7.5 })).toEqual({ closeObservationIntervalMinutes: 'A whole number of minutes' });
    expect(messages({ naloxoneClosePeriodMinutes: null })).toEqual({ naloxoneClosePeriodMinutes: 'A whole number of minutes' });
  });
});
