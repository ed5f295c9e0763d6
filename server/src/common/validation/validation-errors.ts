import { BadRequestException, type ValidationError } from '@nestjs/common';
import type { FieldError } from '@lockstep/shared';

/** Flattens class-validator's nested errors into `{field, message}` with dotted paths. */
export function flattenValidationErrors(errors: ValidationError[], parent = ''): FieldError[] {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({ field, message }));
    return [...own, ...flattenValidationErrors(error.children ?? [], field)];
  });
}

export function validationExceptionFactory(errors: ValidationError[]): BadRequestException {
  const fieldErrors = flattenValidationErrors(errors);
  const fields = [...new Set(fieldErrors.map((e) => e.field))].join(', ');
  return new BadRequestException({
    statusCode: 400,
    message: `Please correct: ${fields}`,
    errors: fieldErrors,
  });
}
