import { z } from 'zod';
import { momentSchema } from '../api/date-time.js';
import { must } from '../api/request-rules.js';
import { reasonText, signatureSchema } from '../orders/order.schema.js';
import { colleagueSchema, pumpSettingsSchema } from './bedside-requests.schema.js';
import { NALOXONE_UNITS } from './pca-pause.js';

// Naloxone, pausing and resuming a PCA. Messages are the server DTOs' own (server/src/bedside/dto/pause.dto.ts).

const TOO_LONG = 'At most 1,000 characters';

/** Naloxone given by the signed-in nurse, who signs with their password; it pauses the PCA. */
export const naloxoneSchema = z.strictObject({
  dose: z.number(must('Enter the naloxone dose', 'The dose must be a number')).positive('The dose must be more than 0'),
  doseUnit: z.enum(NALOXONE_UNITS, must('Choose mcg or mg', 'Choose mcg or mg')),
  /** When it was given; left out means now. */
  givenAt: momentSchema('Enter when naloxone was given', 'Enter when naloxone was given').nullish(),
  signature: signatureSchema,
});
export type NaloxoneRequest = z.infer<typeof naloxoneSchema>;

export const pauseSchema = z.strictObject({
  reason: reasonText('Give the reason for pausing', 'Give the reason for pausing', TOO_LONG),
});
export type PauseRequest = z.infer<typeof pauseSchema>;

const settings = z.strictObject(pumpSettingsSchema.shape, must('Enter the pump settings'));
const witness = z.strictObject(
  colleagueSchema.extend({ settings }).shape,
  must('A second nurse signs in and reads the pump independently'),
);

/** Resuming: both nurses re-enter the pump settings, as at a bedside check; both must equal the order. */
export const resumeSchema = z.strictObject({
  reason: reasonText('Give the reason for resuming', 'Give the reason for resuming', TOO_LONG),
  settings,
  witness,
});
export type ResumeRequest = z.infer<typeof resumeSchema>;
