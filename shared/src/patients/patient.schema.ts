import { z } from 'zod';
import type { AllergySeverity } from '../dose/types.js';

export const SEXES = ['female', 'male', 'other', 'unknown'] as const;
export const sexSchema = z.enum(SEXES);
export type Sex = z.infer<typeof sexSchema>;

/** How bad a recorded reaction was, mildest first: an intolerance, an allergy, anaphylaxis. */
export const ALLERGY_SEVERITIES = ['intolerance', 'allergy', 'anaphylaxis'] as const satisfies readonly AllergySeverity[];
export const allergySeveritySchema = z.enum(ALLERGY_SEVERITIES);

/** One recorded allergy: a formulary drug (`drugId`) or free text, the reaction, its severity, who recorded it and when. */
const patientAllergyEntrySchema = z.object({
  id: z.number().int(),
  /** The formulary drug, or null for free text (a drug not on the formulary, a food, latex…). */
  drugId: z.number().int().nullable(),
  substance: z.string(),
  reaction: z.string(),
  severity: allergySeveritySchema,
  /** Null for entries moved from the old free-text field, which did not say who wrote them. */
  recordedByName: z.string().nullable(),
  recordedAt: z.string().nullable(),
});
export type PatientAllergyEntry = z.infer<typeof patientAllergyEntrySchema>;

export const patientSchema = z.object({
  id: z.number().int(),
  mrn: z.string(),
  givenName: z.string(),
  familyName: z.string(),
  dateOfBirth: z.string(), // ISO date, yyyy-mm-dd
  sex: sexSchema,
  weightKg: z.number().nullable(),
  /** yyyy-mm-dd the weight was measured; null when not recorded. */
  weightMeasuredOn: z.string().nullable(),
  /** Recorded allergies, most severe first. */
  allergies: z.array(patientAllergyEntrySchema),
  /** True only when a clinician recorded "no known allergies"; an empty list alone means none recorded yet. */
  noKnownAllergies: z.boolean(),
  /** Follows the recorded basis (see opioid-tolerance.ts); true without a basis only on records from before bases were kept. */
  opioidTolerant: z.boolean(),
  /** The tolerance basis: oral morphine (or equianalgesic) mg a day, and for how many days; null when not recorded. */
  toleranceOralMorphineMgPerDay: z.number().nullable(),
  toleranceDays: z.number().int().nullable(),
  /** NEWS2 SpO2 scale: 2 only for confirmed hypercapnic respiratory failure, chosen by a prescriber (RCP, NEWS2, 2017). */
  spo2Scale: z.enum(['1', '2']),
  sleepApnoea: z.boolean(),
  otherSedatives: z.boolean(),
  wardId: z.number().int(),
  wardName: z.string(),
  bed: z.string(),
});
export type Patient = z.infer<typeof patientSchema>;
