import { z } from 'zod';

/** One failing input field. `field` is a dotted path, e.g. `settings.lockoutMinutes`. */
export const fieldErrorSchema = z.object({
  field: z.string(),
  message: z.string(),
});
export type FieldError = z.infer<typeof fieldErrorSchema>;

/** The body of every error answer from the API. `errors` is present on 400s for bad input. */
export const apiErrorSchema = z.object({
  statusCode: z.number().int(),
  message: z.string(),
  errors: z.array(fieldErrorSchema).optional(),
});
export type ApiError = z.infer<typeof apiErrorSchema>;
