import { z } from 'zod';
import { momentSchema } from '../api/date-time.js';
import { atMost, isWhole, must } from '../api/request-rules.js';
import { CONSCIOUSNESS_LEVELS } from './news2.js';
import { SEDATION_LEVELS } from './sedation-scale.js';

/** How supplemental oxygen is given; air is 0 L/min and no device. */
export const OXYGEN_DEVICES = ['nasal-cannula', 'simple-mask', 'venturi-mask', 'reservoir-mask', 'high-flow', 'other'] as const;
export type OxygenDevice = (typeof OXYGEN_DEVICES)[number];
export const OXYGEN_DEVICE_LABELS: Record<OxygenDevice, string> = {
  'nasal-cannula': 'Nasal cannula',
  'simple-mask': 'Simple face mask',
  'venturi-mask': 'Venturi mask',
  'reservoir-mask': 'Reservoir (non-rebreathe) mask',
  'high-flow': 'High-flow nasal oxygen',
  other: 'Other',
};

/** What a request without the oxygen is told: SpO2 is always recorded, and oxygen beside it. */
export const OXYGEN_REQUIRED_MESSAGE = 'Record the oxygen: 0 for air, or litres per minute';

/** A number in a range, with the DTO's words; optional (blank is "not recorded"). */
const ranged = (min: number, max: number, whole: boolean, messages: { type: string; range: string }) => {
  const base = z.number(must(messages.type, messages.type));
  return (whole ? base.refine(isWhole, messages.type) : base).min(min, messages.range).max(max, messages.range).nullish();
};

/** A whole number from 0 to `max`, with the DTO's words. */
const count = (max: number, messages: { required: string; whole: string; negative: string; tooLarge: string }) =>
  z.number(must(messages.required, messages.whole)).refine(isWhole, messages.whole).min(0, messages.negative).max(max, messages.tooLarge);

const millilitres = (messages: { required: string; number: string; negative: string; tooLarge: string }) =>
  z.number(must(messages.required, messages.number)).min(0, messages.negative).max(1000, messages.tooLarge);

/** An observation of a running PCA: the patient, and the pump's running totals. */
export const createObservationSchema = z.strictObject({
  /** Defaults to now; never in the future, never before the PCA started (the server checks both). */
  at: momentSchema('Enter the time of the observation', 'Enter the time of the observation').nullish(),
  painScore: count(10, {
    required: 'Enter the pain score',
    whole: 'Pain score is a whole number from 0 to 10',
    negative: 'Pain score is 0 to 10',
    tooLarge: 'Pain score is 0 to 10',
  }),
  sedationLevel: z.enum(SEDATION_LEVELS, must('Enter the sedation level', 'Sedation level is S, 1, 2, 3 or 4')),
  respiratoryRate: count(80, {
    required: 'Enter the respiratory rate',
    whole: 'Respiratory rate is a whole number per minute',
    negative: 'Respiratory rate is 0 to 80 per minute',
    tooLarge: 'Respiratory rate is 0 to 80 per minute',
  }),
  spo2: count(100, {
    required: 'Enter the SpO2',
    whole: 'SpO2 is a whole number of %',
    negative: 'SpO2 is 0 to 100 %',
    tooLarge: 'SpO2 is 0 to 100 %',
  }),
  /**
   * Supplemental oxygen in L/min; 0 is air. Required: SpO2 is always recorded, and oxygen keeps the oximeter up
   * while breathing slows. The device goes with it (shared oxygenErrors: needed above 0, refused at 0).
   */
  oxygenLitresPerMinute: z
    .number(must(OXYGEN_REQUIRED_MESSAGE, 'Oxygen is a number of litres per minute (0 for air)'))
    .min(0, 'Oxygen is 0 (air) to 60 L/min')
    .max(60, 'Oxygen is 0 (air) to 60 L/min'),
  oxygenDevice: z.enum(OXYGEN_DEVICES, must('Choose the oxygen device', 'Choose the oxygen device from the list')).nullish(),
  heartRate: ranged(0, 300, true, { type: 'Heart rate is a whole number per minute', range: 'Heart rate is 0 to 300 per minute' }),
  systolicBp: ranged(0, 300, true, {
    type: 'Systolic blood pressure is a whole number of mmHg',
    range: 'Systolic blood pressure is 0 to 300 mmHg',
  }),
  temperatureC: ranged(25, 45, false, { type: 'Temperature is a number of °C', range: 'Temperature is 25 to 45 °C' }),
  consciousness: z
    .enum(
      CONSCIOUSNESS_LEVELS,
      must('Choose the level of consciousness', 'Consciousness is alert, new confusion, voice, pain or unresponsive'),
    )
    .nullish(),
  attempts: count(100_000, {
    required: 'Enter the attempts from the pump',
    whole: 'Attempts is a whole number from the pump',
    negative: 'Attempts cannot be negative',
    tooLarge: 'Attempts looks too large: check the pump',
  }),
  delivered: count(100_000, {
    required: 'Enter the doses delivered from the pump',
    whole: 'Delivered is a whole number from the pump',
    negative: 'Delivered cannot be negative',
    tooLarge: 'Delivered looks too large: check the pump',
  }),
  volumeInfusedMl: millilitres({
    required: 'Enter the volume infused from the pump',
    number: 'Volume infused is a number of mL',
    negative: 'Volume infused cannot be negative',
    tooLarge: 'Volume infused looks too large: check the pump',
  }),
  syringeRemainingMl: millilitres({
    required: 'Enter the volume left in the syringe',
    number: 'Syringe remaining is a number of mL',
    negative: 'Syringe remaining cannot be negative',
    tooLarge: 'Syringe remaining looks too large: check the syringe',
  }),
  note: z.string('The note must be text').refine(atMost(2000), 'The note is at most 2,000 characters').nullish(),
});
export type CreateObservationRequest = z.infer<typeof createObservationSchema>;
