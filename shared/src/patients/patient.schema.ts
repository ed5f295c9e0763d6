import { z } from 'zod';

export const SEXES = ['female', 'male', 'other', 'unknown'] as const;
export const sexSchema = z.enum(SEXES);
export type Sex = z.infer<typeof sexSchema>;

export const patientSchema = z.object({
  id: z.number().int(),
  mrn: z.string(),
  givenName: z.string(),
  familyName: z.string(),
  dateOfBirth: z.string(), // ISO date, yyyy-mm-dd
  sex: sexSchema,
  weightKg: z.number().nullable(),
  allergies: z.string(),
  opioidTolerant: z.boolean(),
  sleepApnoea: z.boolean(),
  otherSedatives: z.boolean(),
  wardId: z.number().int(),
  wardName: z.string(),
  bed: z.string(),
});
export type Patient = z.infer<typeof patientSchema>;
