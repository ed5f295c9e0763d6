import { z } from 'zod';
import { calendarDaySchema } from '../api/date-time.js';
import { atLeast, atMost, isWhole, must } from '../api/request-rules.js';
import { reasonText } from '../orders/order.schema.js';

// The bedside requests: each nurse's check of the pump, and the witnessed steps (bolus, syringe
// change, discontinue). Messages are the server DTOs' own (server/src/bedside/dto).

const reading = (required: string, wrongType: string, negative: string) => z.number(must(required, wrongType)).min(0, negative);
/** Null when the pump has none set; left out is refused, so a nurse cannot skip the field. */
const noneOrReading = (label: string, name: string) =>
  z
    .number(must(`Enter the ${label}, or leave it empty (null) for none`, `${name} must be a number, or empty for none`))
    .min(0, `${name} cannot be negative`)
    .nullable();

/** What a nurse reads off the programmed pump and the syringe, entered independently by each nurse. */
export const pumpSettingsSchema = z.strictObject({
  drugId: z.number(must('Choose the drug')).refine(isWhole, 'Choose the drug').positive('Choose the drug'),
  concentrationPerMl: z
    .number(must('Enter the concentration', 'Concentration must be a number'))
    .positive('Concentration must be more than 0'),
  syringeVolumeMl: z
    .number(must('Enter the syringe volume', 'Syringe volume must be a number of mL'))
    .positive('Syringe volume must be more than 0'),
  loadingDose: noneOrReading('loading dose', 'Loading dose'),
  demandDose: reading('Enter the demand dose', 'Demand dose must be a number', 'Demand dose cannot be negative'),
  lockoutMinutes: reading('Enter the lockout', 'Lockout must be a number of minutes', 'Lockout cannot be negative'),
  basalRatePerHour: reading(
    'Enter the basal rate (0 for none)',
    'Basal rate must be a number (0 for none)',
    'Basal rate cannot be negative',
  ),
  oneHourLimit: noneOrReading('1-hour limit', '1-hour limit'),
  fourHourLimit: noneOrReading('4-hour limit', '4-hour limit'),
});
const settings = z.strictObject(pumpSettingsSchema.shape, must('Enter the pump settings'));

/** A colleague signs in on the same screen: username and password. */
export const colleagueSchema = z.strictObject({
  username: z
    .string(must('Enter the username'))
    .trim()
    .refine(atLeast(1), 'Enter the username')
    .refine(atMost(64), 'Username is at most 64 characters'),
  password: z
    .string(must('Enter the password'))
    .refine(atLeast(1), 'Enter the password')
    .refine(atMost(256), 'Password is at most 256 characters'),
});
export type ColleagueRequest = z.infer<typeof colleagueSchema>;

const text = (message: string, max: number, tooLong: string) =>
  z.string(must(message)).refine(atLeast(1), message).refine(atMost(max), tooLong);

/** The first nurse: the wristband, the syringe's release code and the pump settings. */
export const firstCheckSchema = z.strictObject({
  patientMrn: text('Enter the MRN from the wristband', 32, 'MRN is at most 32 characters'),
  patientDateOfBirth: calendarDaySchema(
    'Enter the date of birth from the wristband',
    'Enter the date of birth from the wristband (yyyy-mm-dd)',
  ),
  releaseCode: text('Enter the release code from the syringe label', 16, 'A release code is 6 characters'),
  settings,
});
export type FirstCheckRequest = z.infer<typeof firstCheckSchema>;

/** The second nurse signs in on the same screen and reads the pump independently. */
export const secondCheckSchema = colleagueSchema.extend({ settings });
export type SecondCheckRequest = z.infer<typeof secondCheckSchema>;

const witness = z.strictObject(colleagueSchema.shape, must('A second nurse signs as witness'));
const TOO_LONG = 'At most 1,000 characters';

export const bolusSchema = z.strictObject({
  witness,
  amount: z.number(must('Enter the bolus amount', 'The bolus must be a number')).positive('The bolus must be more than 0'),
  reason: reasonText('Give the reason for the bolus (e.g. breakthrough pain)', 'Give the reason for the bolus', TOO_LONG),
  /** Needed when the amount is outside the ward's soft limit for a clinician bolus. */
  overrideReason: reasonText('overrideReason must be text', 'overrideReason must be text', TOO_LONG).nullish(),
});
export type BolusRequest = z.infer<typeof bolusSchema>;

const infused = (required: string) => reading(required, 'Volume infused must be a number of mL', 'Volume infused cannot be negative');
const wasted = (required: string) => reading(required, 'Waste must be a number of mL', 'Waste cannot be negative');

export const syringeChangeSchema = z.strictObject({
  witness,
  volumeInfusedMl: infused('Enter the volume infused from the old syringe'),
  wastedMl: wasted('Enter the volume wasted from the old syringe'),
  newReleaseCode: text('Enter the new syringe’s release code', 16, 'A release code is 6 characters'),
});
export type SyringeChangeRequest = z.infer<typeof syringeChangeSchema>;

export const discontinueSchema = z.strictObject({
  witness,
  reason: reasonText('Give the reason (the prescriber’s decision)', 'Give the reason (the prescriber’s decision)', TOO_LONG),
  volumeInfusedMl: infused('Enter the final volume infused from the pump'),
  wastedMl: wasted('Enter the volume wasted'),
});
export type DiscontinueRequest = z.infer<typeof discontinueSchema>;
