import { ValidationPipe } from '@nestjs/common';
import { validationExceptionFactory } from './validation-errors.js';

export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    // One clear message per field (the first rule it breaks) rather than a pile of them.
    stopAtFirstError: true,
    exceptionFactory: validationExceptionFactory,
  });
}
