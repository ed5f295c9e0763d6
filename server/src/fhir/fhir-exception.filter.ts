import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { FHIR_JSON_MEDIA_TYPE, toOperationOutcome } from '@lockstep/shared';

/**
 * FHIR routes answer errors the FHIR way, as an OperationOutcome in `application/fhir+json` with
 * the same status code the rest of the API would give (the guards' 401 and 403 included). As in
 * AllExceptionsFilter, anything unexpected is logged and answered without internals.
 */
@Catch()
export class FhirExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('FhirExceptions');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const known = exception instanceof HttpException && exception.getStatus() < HttpStatus.INTERNAL_SERVER_ERROR;
    const status = exception instanceof HttpException ? exception.getStatus() : HttpStatus.INTERNAL_SERVER_ERROR;
    if (!known) this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    const message = known ? exception.message : 'Something went wrong on the server. Please try again.';
    response.status(status).type(FHIR_JSON_MEDIA_TYPE).json(toOperationOutcome(status, message));
  }
}
