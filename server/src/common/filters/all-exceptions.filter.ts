import {
  type ArgumentsHost,
  Catch,
  type ExceptionFilter,
  HttpException,
  HttpStatus,
  Logger,
} from '@nestjs/common';
import type { Response } from 'express';
import type { ApiError, FieldError } from '@lockstep/shared';

/**
 * Every error answer has one shape, `{statusCode, message, errors?}`. Anything that is not an
 * HttpException is logged and answered as a 500 without internals. Errors raised by Express
 * middleware before Nest (malformed JSON, body too large) carry a status and are passed through.
 */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Exceptions');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = this.toApiError(exception);
    if (body.statusCode >= 500) {
      this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    }
    response.status(body.statusCode).json(body);
  }

  private toApiError(exception: unknown): ApiError {
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const raw = exception.getResponse();
      if (typeof raw === 'string') return { statusCode, message: raw };
      // Extra keys a service adds (e.g. `currentStatus` on a 409) pass through; Nest's `error` does not.
      const { message, errors, error: _error, statusCode: _statusCode, ...extra } = raw as {
        message?: unknown;
        errors?: FieldError[];
        error?: unknown;
        statusCode?: unknown;
      };
      const text = Array.isArray(message) ? message.join('; ') : typeof message === 'string' ? message : exception.message;
      return { statusCode, message: text, ...(errors ? { errors } : {}), ...extra };
    }
    const status = (exception as { status?: unknown; type?: unknown })?.status;
    if (typeof status === 'number' && status >= 400 && status < 500) {
      return { statusCode: status, message: describeClientError(exception as { type?: unknown }) };
    }
    return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, message: 'Something went wrong on the server. Please try again.' };
  }
}

function describeClientError(error: { type?: unknown }): string {
  switch (error.type) {
    case 'entity.parse.failed':
      return 'The request body is not valid JSON';
    case 'entity.too.large':
      return 'The request body is too large';
    default:
      return 'The request could not be read';
  }
}
