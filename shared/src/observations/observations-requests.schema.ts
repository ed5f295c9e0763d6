import { z } from 'zod';
import { momentSchema } from '../api/date-time.js';
import { atMost, isWhole, must } from '../api/request-rules.js';
import { SEDATION_LEVELS } from './sedation-scale.js';

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
