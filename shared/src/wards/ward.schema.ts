import { z } from 'zod';

export const wardSchema = z.object({
  id: z.number().int(),
  code: z.string(),
  name: z.string(),
  specialty: z.string(),
  weightBasedDosing: z.boolean(),
});
export type Ward = z.infer<typeof wardSchema>;
