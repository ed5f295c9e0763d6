import { BadRequestException } from '@nestjs/common';
import type { FieldError } from '@lockstep/shared';

/** A 400 about one input field, in the API's error shape; the field repeats the message. */
export function fieldError(field: string, message: string): BadRequestException {
  return fieldErrors(message, [{ field, message }]);
}

/** A 400 with an overall message and one entry per field that needs correcting. */
export function fieldErrors(message: string, errors: FieldError[]): BadRequestException {
  return new BadRequestException({ statusCode: 400, message, errors });
}
