import { describe, expect, it } from 'vitest';
import { DEFAULT_WARD_POLICY, type WardPolicySettings } from '@lockstep/shared';
import {
  emailError,
  formatPolicyValue,
  POLICY_NUMBER_FIELDS,
  policyChanges,
  policyNumberError,
  policyToForm,
  shippedDefault,
  validatePolicyForm,
} from './policy-form';

const SAVED: WardPolicySettings = { ...DEFAULT_WARD_POLICY, pharmacyEmail: 'pharmacy.harbour@kestrelbay.example', nurseInChargeEmail: '' };
const field = (key: string) => {
  const found = POLICY_NUMBER_FIELDS.find((f) => f.key === key);
  if (!found) throw new Error(key);
  return found;
};

describe('policy fields', () => {
  it('cover every value of the ward policy, the close-observation settings included', () => {
    expect(POLICY_NUMBER_FIELDS.map((f) => f.key).sort()).toEqual(Object.keys(DEFAULT_WARD_POLICY).sort());
  });

  it('show the shipped defaults with their units', () => {
    expect(POLICY_NUMBER_FIELDS.map(shippedDefault)).toEqual([
      '60 min',
      '120 min',
      '15 min', // close observation every 15 minutes: common practice (ASPMN guideline, Jarzyna et al. 2011, gives no single interval)
      '60 min', // for the first hour: common practice
      '120 min', // 2 hours after naloxone, which wears off before most opioids: common practice, no single published interval
      '9/min', // urgent at 8/min or below: NEWS2, Royal College of Physicians 2017
      '92 %', // urgent at 91 % or below: NEWS2 scale 1, Royal College of Physicians 2017
      '7/10',
      '2 attempts per dose',
      '2 h',
      '0.5 mL',
      '7 days', // weight age: a local default, common practice
    ]);
    expect(formatPolicyValue(field('syringeLowThresholdHours'), 1.5)).toBe('1.5 h');
  });
});

describe('range checks, in the server’s words', () => {
  it('holds each value to its range', () => {
    // Floors (shared WARD_POLICY_FLOORS): NEWS2 (Royal College of Physicians 2017); intervals common practice.
    expect(policyNumberError(field('spo2Threshold'), 91)).toMatch(/^At least 92 %: SpO2 of 91 % or below is always urgent/);
    expect(policyNumberError(field('spo2Threshold'), 101)).toBe('At most 100 %');
    expect(policyNumberError(field('spo2Threshold'), 92.5)).toBe('A whole number of %');
    expect(policyNumberError(field('spo2Threshold'), 92)).toBeNull();
    expect(policyNumberError(field('observationIntervalFirst24hMinutes'), 61)).toMatch(/^At most 60 minutes/);
    expect(policyNumberError(field('observationIntervalMinutes'), 120)).toBeNull();
    expect(policyNumberError(field('observationIntervalMinutes'), 121)).toMatch(/^At most 120 minutes/);
    expect(policyNumberError(field('respiratoryRateThreshold'), 8)).toMatch(
      /^At least 9 per minute: a rate of 8\/min or below is always urgent/,
    );
    expect(policyNumberError(field('syringeLowThresholdHours'), 0.25)).toBe('At least 0.5 hours');
    expect(policyNumberError(field('reconciliationToleranceMl'), -1)).toBe('Cannot be negative');
    expect(policyNumberError(field('painNotControlledRatio'), 1.5)).toBeNull();
    expect(policyNumberError(field('painNotControlledScore'), '')).toBe('Enter a value');
    expect(policyNumberError(field('weightMaxAgeDays'), 0)).toBe('At least 1 day');
    expect(policyNumberError(field('weightMaxAgeDays'), 1.5)).toBe('A whole number of days');
  });

  it('holds the close-observation settings to the floors (shared WARD_POLICY_FLOORS; common practice)', () => {
    expect(policyNumberError(field('closeObservationIntervalMinutes'), 15)).toBeNull();
    expect(policyNumberError(field('closeObservationIntervalMinutes'), 16)).toMatch(/^At most 15 minutes: close observation/);
    expect(policyNumberError(field('closeObservationIntervalMinutes'), 5)).toBeNull();
    expect(policyNumberError(field('closeObservationIntervalMinutes'), 4)).toBe('At least 5 minutes');
    expect(policyNumberError(field('closeObservationIntervalMinutes'), 7.5)).toBe('A whole number of minutes');
    expect(policyNumberError(field('closeObservationPeriodMinutes'), 60)).toBeNull();
    expect(policyNumberError(field('closeObservationPeriodMinutes'), 59)).toMatch(/^At least 60 minutes/);
    expect(policyNumberError(field('closeObservationPeriodMinutes'), 241)).toBe('At most 240 minutes');
    expect(policyNumberError(field('naloxoneClosePeriodMinutes'), 120)).toBeNull();
    expect(policyNumberError(field('naloxoneClosePeriodMinutes'), 119)).toMatch(/^At least 120 minutes: naloxone wears off/);
    expect(policyNumberError(field('naloxoneClosePeriodMinutes'), 720)).toBeNull();
    expect(policyNumberError(field('naloxoneClosePeriodMinutes'), 721)).toBe('At most 720 minutes');
    expect(policyNumberError(field('naloxoneClosePeriodMinutes'), '')).toBe('Enter a value');
  });

  it('takes an e-mail address or nothing', () => {
    expect(emailError('')).toBeNull();
    expect(emailError('nic.harbour@kestrelbay.example')).toBeNull();
    expect(emailError('harbour ward')).toBe('Enter an e-mail address (or leave empty)');
  });

  it('checks the whole form', () => {
    expect(validatePolicyForm(policyToForm(SAVED))).toEqual({});
    expect(validatePolicyForm({ ...policyToForm(SAVED), spo2Threshold: 20, pharmacyEmail: 'x' })).toEqual({
      spo2Threshold: expect.stringMatching(/^At least 92 %/),
      pharmacyEmail: 'Enter an e-mail address (or leave empty)',
    });
  });
});

describe('policyChanges', () => {
  it('sends only what changed, numbers as numbers and e-mails trimmed', () => {
    expect(policyChanges(policyToForm(SAVED), SAVED)).toEqual({});
    expect(policyChanges({ ...policyToForm(SAVED), spo2Threshold: '94', nurseInChargeEmail: ' nic@kestrelbay.example ' }, SAVED)).toEqual({
      spo2Threshold: 94,
      nurseInChargeEmail: 'nic@kestrelbay.example',
    });
    expect(policyChanges({ ...policyToForm(SAVED), naloxoneClosePeriodMinutes: '180' }, SAVED)).toEqual({
      naloxoneClosePeriodMinutes: 180,
    });
  });
});
