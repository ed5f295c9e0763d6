import { z } from 'zod';
import { POPULATIONS } from '../library/rule-population.js';

export const wardSchema = z.object({
  id: z.number().int(),
  code: z.string(),
  name: z.string(),
  specialty: z.string(),
  weightBasedDosing: z.boolean(),
  /** Who the ward cares for: 'paediatric' wards judge observations by the children's bands. Separate from weight-based dosing. */
  population: z.enum(POPULATIONS),
});
export type Ward = z.infer<typeof wardSchema>;
