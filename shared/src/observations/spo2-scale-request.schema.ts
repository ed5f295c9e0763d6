import { z } from 'zod';
import { must } from '../api/request-rules.js';
import { SPO2_SCALES } from './news2.js';

/**
 * A patient's NEWS2 SpO2 scale, chosen by a prescriber: scale 2 only for confirmed hypercapnic respiratory failure
 * (Royal College of Physicians, NEWS2, 2017); scale 1 for everyone else.
 */
export const spo2ScaleRequestSchema = z.strictObject({
  spo2Scale: z.enum(SPO2_SCALES, must('Choose SpO2 scale 1 or 2', 'SpO2 scale is 1 or 2')),
});
export type Spo2ScaleRequest = z.infer<typeof spo2ScaleRequestSchema>;
