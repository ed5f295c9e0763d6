import { z } from 'zod';

export const DOSE_UNITS = ['mg', 'mcg'] as const;
export const doseUnitSchema = z.enum(DOSE_UNITS);
export type DoseUnit = z.infer<typeof doseUnitSchema>;

export const drugSchema = z.object({
  id: z.number().int(),
  genericName: z.string(),
  doseUnit: doseUnitSchema,
});
export type Drug = z.infer<typeof drugSchema>;
