import { z } from 'zod';

/** One failing input field. `field` is a dotted path, e.g. `settings.lockoutMinutes`. */
export const fieldErrorSchema = z.object({
  field: z.string(),
  message: z.string(),
  /** For an uploaded file: the spreadsheet row (header = 1) and column of the problem. */
  row: z.number().int().optional(),
  column: z.string().optional(),
});
export type FieldError = z.infer<typeof fieldErrorSchema>;

/** The body of every error answer from the API. `errors` is present on 400s for bad input. */
export const apiErrorSchema = z.object({
  statusCode: z.number().int(),
  message: z.string(),
  errors: z.array(fieldErrorSchema).optional(),
});
export type ApiError = z.infer<typeof apiErrorSchema>;
