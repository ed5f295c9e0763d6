import { BadRequestException } from '@nestjs/common';

/** A 400 about one input field, in the API's error shape. */
export function fieldError(field: string, message: string): BadRequestException {
  return new BadRequestException({ statusCode: 400, message, errors: [{ field, message }] });
}
