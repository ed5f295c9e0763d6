import { z } from 'zod';
import { isEmailAddress } from '../api/email.js';
import { isWhole } from '../api/request-rules.js';
import { WARD_POLICY_FLOORS as FLOORS } from '../observations/ward-policy.js';

// A setting left out stays as it is; a null is refused (with the type's message), never taken to blank it.
const whole = (min: number, max: number, messages: { whole: string; low: string; high: string }) =>
  z.number(messages.whole).refine(isWhole, messages.whole).min(min, messages.low).max(max, messages.high).optional();
const amount = (min: number, max: number, messages: { number: string; low: string; high: string }) =>
  z.number(messages.number).min(min, messages.low).max(max, messages.high).optional();
const NOT_AN_EMAIL = 'Enter an e-mail address (or leave empty)';
/** Empty for none. */
const email = z
  .string(NOT_AN_EMAIL)
  .refine((text) => text === '' || isEmailAddress(text), NOT_AN_EMAIL)
  .optional();

/** A change to a ward's monitoring and escalation settings; only the settings sent change. */
export const updateWardPolicySchema = z.strictObject({
  // A ward can tighten but not loosen past WARD_POLICY_FLOORS (sources beside them).
  observationIntervalFirst24hMinutes: whole(15, FLOORS.observationIntervalFirst24hMinutes.max, {
    whole: 'A whole number of minutes',
    low: 'At least 15 minutes',
    high: FLOORS.observationIntervalFirst24hMinutes.message,
  }),
  observationIntervalMinutes: whole(15, FLOORS.observationIntervalMinutes.max, {
    whole: 'A whole number of minutes',
    low: 'At least 15 minutes',
    high: FLOORS.observationIntervalMinutes.message,
  }),
  closeObservationIntervalMinutes: whole(5, FLOORS.closeObservationIntervalMinutes.max, {
    whole: 'A whole number of minutes',
    low: 'At least 5 minutes',
    high: FLOORS.closeObservationIntervalMinutes.message,
  }),
  closeObservationPeriodMinutes: whole(FLOORS.closeObservationPeriodMinutes.min, 240, {
    whole: 'A whole number of minutes',
    low: FLOORS.closeObservationPeriodMinutes.message,
    high: 'At most 240 minutes',
  }),
  naloxoneClosePeriodMinutes: whole(FLOORS.naloxoneClosePeriodMinutes.min, 720, {
    whole: 'A whole number of minutes',
    low: FLOORS.naloxoneClosePeriodMinutes.message,
    high: 'At most 720 minutes',
  }),
  respiratoryRateThreshold: whole(FLOORS.respiratoryRateThreshold.min, 20, {
    whole: 'A whole number per minute',
    low: FLOORS.respiratoryRateThreshold.message,
    high: 'At most 20 per minute',
  }),
  spo2Threshold: whole(FLOORS.spo2Threshold.min, 100, {
    whole: 'A whole number of %',
    low: FLOORS.spo2Threshold.message,
    high: 'At most 100 %',
  }),
  syringeLowThresholdHours: amount(0.5, 24, { number: 'A number of hours', low: 'At least 0.5 hours', high: 'At most 24 hours' }),
  reconciliationToleranceMl: amount(0, 10, { number: 'A number of mL', low: 'Cannot be negative', high: 'At most 10 mL' }),
  painNotControlledScore: whole(0, 10, { whole: 'A whole pain score', low: 'Pain score is 0 to 10', high: 'Pain score is 0 to 10' }),
  painNotControlledRatio: amount(1, 20, { number: 'A number of attempts per delivered dose', low: 'At least 1', high: 'At most 20' }),
  weightMaxAgeDays: whole(1, 365, { whole: 'A whole number of days', low: 'At least 1 day', high: 'At most 365 days' }),
  pharmacyEmail: email,
  nurseInChargeEmail: email,
});
export type UpdateWardPolicyRequest = z.infer<typeof updateWardPolicySchema>;
