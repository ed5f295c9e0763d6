import { Logger } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { clientAddress } from '../request-context/request-context.js';

const logger = new Logger('HTTP');

/**
 * One structured line per API request, written when the answer is finished (or the caller goes
 * away). It names the route, never what was sent: no query string (the place a secret would
 * leak from a URL), body, password, token or Authorization header. Static files of the client
 * are not logged.
 */
export function requestLoggerMiddleware(req: Request, res: Response, next: NextFunction): void {
  const path = req.originalUrl.split('?')[0];
  if (!/^\/api(\/|$)/.test(path)) return next();
  const started = process.hrtime.bigint();
  res.once('close', () => {
    const entry = {
      method: req.method,
      path,
      status: res.statusCode,
      durationMs: Math.round(Number(process.hrtime.bigint() - started) / 1e5) / 10,
      userId: (req.user as { id?: number } | undefined)?.id ?? null,
      address: clientAddress(req),
      ...(res.writableFinished ? {} : { aborted: true }),
    };
    if (res.statusCode >= 500) logger.error('request', entry);
    else logger.log('request', entry);
  });
  next();
}
