import { type ArgumentsHost, Catch, type ExceptionFilter, PayloadTooLargeException } from '@nestjs/common';
import type { Response } from 'express';
import { fieldError } from '../common/errors/field-error.js';
import { FILE_TOO_LARGE } from './library-csv-limit.js';

/** Multer stops reading at its size limit; answer that as the same clear 400 as any other bad file. */
@Catch(PayloadTooLargeException)
export class UploadTooLargeFilter implements ExceptionFilter {
  catch(_exception: PayloadTooLargeException, host: ArgumentsHost): void {
    const answer = fieldError('file', FILE_TOO_LARGE);
    host.switchToHttp().getResponse<Response>().status(answer.getStatus()).json(answer.getResponse());
  }
}
