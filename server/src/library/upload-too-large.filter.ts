import { type ArgumentsHost, Catch, type ExceptionFilter, PayloadTooLargeException } from '@nestjs/common';
import type { Response } from 'express';

/** Multer stops reading at its size limit; answer that as the same clear 400 as any other bad file. */
@Catch(PayloadTooLargeException)
export class UploadTooLargeFilter implements ExceptionFilter {
  catch(_exception: PayloadTooLargeException, host: ArgumentsHost): void {
    const message = 'The file is over 1 MB; a dose-limit library CSV is far smaller';
    host
      .switchToHttp()
      .getResponse<Response>()
      .status(400)
      .json({ statusCode: 400, message, errors: [{ field: 'file', message }] });
  }
}
