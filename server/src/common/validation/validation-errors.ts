import type { BadRequestException, ValidationError } from '@nestjs/common';
import type { FieldError } from '@lockstep/shared';
import { fieldErrors } from '../errors/field-error.js';

/** Flattens class-validator's nested errors into `{field, message}` with dotted paths. */
export function flattenValidationErrors(errors: ValidationError[], parent = ''): FieldError[] {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({ field, message }));
    return [...own, ...flattenValidationErrors(error.children ?? [], field)];
  });
}

export function validationExceptionFactory(errors: ValidationError[]): BadRequestException {
  const flat = flattenValidationErrors(errors);
  const fields = [...new Set(flat.map((e) => e.field))].join(', ');
  return fieldErrors(`Please correct: ${fields}`, flat);
}
