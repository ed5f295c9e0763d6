import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import type { ApiError, FieldError } from '@lockstep/shared';
import { TooManyAttemptsException } from '../throttling/too-many-attempts.exception.js';

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
    if (exception instanceof TooManyAttemptsException) response.setHeader('Retry-After', String(exception.retryAfterSeconds));
    response.status(body.statusCode).json(body);
  }

  private toApiError(exception: unknown): ApiError {
    // Nest wraps the body parser's errors (bad JSON, too large) in an HttpException whose message
    // is the parser's own wording; say it plainly instead.
    if (exception instanceof HttpException && isBodyParserError(exception.cause)) {
      return { statusCode: exception.getStatus(), message: describeClientError(exception.cause) };
    }
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const raw = exception.getResponse();
      if (typeof raw === 'string') return { statusCode, message: raw };
      // Extra keys a service adds (e.g. `currentStatus` on a 409) pass through; Nest's `error` does not.
      const {
        message,
        errors,
        error: _error,
        statusCode: _statusCode,
        ...extra
      } = raw as {
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
      return { statusCode: status, message: describeClientError(exception as { type?: unknown; limit?: unknown }) };
    }
    return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, message: 'Something went wrong on the server. Please try again.' };
  }
}

function isBodyParserError(error: unknown): error is { type: string; limit?: unknown } {
  return error instanceof Error && typeof (error as { type?: unknown }).type === 'string';
}

function describeClientError(error: { type?: unknown; limit?: unknown }): string {
  switch (error.type) {
    case 'entity.parse.failed':
      return 'The request body is not valid JSON';
    case 'entity.too.large':
      return typeof error.limit === 'number'
        ? `The request body is too large: the limit is ${Math.round(error.limit / 1024)} kB`
        : 'The request body is too large';
    default:
      return 'The request could not be read';
  }
}
