import type { NextFunction, Request, Response } from 'express';

/**
 * Adds `Server-Timing: app;dur=<ms>` to every answer: the time from the request reaching Express
 * to its headers being written, so guards, validation, queries and the JSON are in it, and the
 * time the request waited for the process before that is not. The benchmark reports it beside
 * the latency a client sees; browsers show it in their network panel.
 */
export function serverTimingMiddleware(_req: Request, res: Response, next: NextFunction): void {
  const started = process.hrtime.bigint();
  const writeHead = res.writeHead;
  res.writeHead = function (this: Response, ...args: unknown[]) {
    const ms = Number(process.hrtime.bigint() - started) / 1e6;
    if (!this.headersSent) this.setHeader('Server-Timing', `app;dur=${ms.toFixed(2)}`);
    return (writeHead as (...rest: unknown[]) => Response).apply(this, args);
  } as typeof res.writeHead;
  next();
}
