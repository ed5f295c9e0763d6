import { z } from 'zod';
import { atLeast, atMost, must } from '../api/request-rules.js';

/** What was done about a flag, in at least 5 characters once trimmed. */
export const acknowledgeFlagSchema = z.strictObject({
  note: z
    .string(must('Say what was done about the flag', 'The note must be text'))
    .trim()
    .refine(atLeast(5), 'Say what was done (at least 5 characters)')
    .refine(atMost(1000), 'The note is at most 1,000 characters'),
});
export type AcknowledgeFlagRequest = z.infer<typeof acknowledgeFlagSchema>;
