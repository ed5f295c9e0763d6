import { z } from 'zod';
import { calendarDaySchema } from '../api/date-time.js';
import { atLeast, atMost, isWhole, must } from '../api/request-rules.js';
import { ALLERGY_SEVERITIES } from './patient.schema.js';
import { TOLERANCE_MAX_DAYS, TOLERANCE_MAX_ORAL_MORPHINE_MG_PER_DAY } from './opioid-tolerance.js';
import { WEIGHT_MAX_KG } from './weight.js';

// The patient record's requests. Messages are the server DTOs' own (server/src/patients/dto).

const text = (required: string, wrongType: string, max: number, tooLong: string) =>
  z.string(must(required, wrongType)).trim().refine(atLeast(1), required).refine(atMost(max), tooLong);

/** One allergy entry: a formulary drug (its name as the substance) or free text, the reaction and its severity. */
export const addAllergySchema = z.strictObject({
  drugId: z
    .number(must('drugId must be a whole number'))
    .refine(isWhole, 'drugId must be a whole number')
    .positive('drugId must be positive')
    .nullish(),
  substance: text('Enter the substance', 'Substance must be text', 120, 'Substance is at most 120 characters'),
  reaction: text('Enter the reaction (or "not known")', 'Reaction must be text', 200, 'Reaction is at most 200 characters'),
  severity: z.enum(ALLERGY_SEVERITIES, must('Choose the severity', 'Severity must be intolerance, allergy or anaphylaxis')),
});
export type AddAllergyRequest = z.infer<typeof addAllergySchema>;

/** Opioid tolerance and its basis; both basis fields null for an opioid-naive patient. */
export const opioidToleranceSchema = z.strictObject({
  opioidTolerant: z.boolean(must('Say whether the patient is opioid tolerant', 'opioidTolerant must be true or false')),
  oralMorphineMgPerDay: z
    .number(must('Enter the oral morphine mg a day, or leave it empty (null) for none', 'Oral morphine a day must be a number of mg'))
    .positive('Oral morphine a day must be more than 0 mg')
    .max(TOLERANCE_MAX_ORAL_MORPHINE_MG_PER_DAY, `Oral morphine a day is at most ${TOLERANCE_MAX_ORAL_MORPHINE_MG_PER_DAY} mg`)
    .nullable(),
  days: z
    .number(must('Enter the number of days, or leave it empty (null) for none', 'Days must be a whole number'))
    .refine(isWhole, 'Days must be a whole number')
    .min(1, 'At least 1 day')
    .max(TOLERANCE_MAX_DAYS, `At most ${TOLERANCE_MAX_DAYS} days`)
    .nullable(),
});
export type OpioidToleranceRequest = z.infer<typeof opioidToleranceSchema>;

/** A new weight and the day it was measured. */
export const recordWeightSchema = z.strictObject({
  weightKg: z
    .number(must('Enter the weight in kg', 'Weight must be a number of kg'))
    .positive('Weight must be more than 0 kg')
    .max(WEIGHT_MAX_KG, `Weight is at most ${WEIGHT_MAX_KG} kg`),
  measuredOn: calendarDaySchema('Enter the date the weight was measured', 'Enter the date the weight was measured (yyyy-mm-dd)'),
});
export type RecordWeightRequest = z.infer<typeof recordWeightSchema>;
