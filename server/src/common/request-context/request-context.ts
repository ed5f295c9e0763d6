import { AsyncLocalStorage } from 'node:async_hooks';
import type { NextFunction, Request, Response } from 'express';

interface RequestContext {
  /** The caller's network address as Express sees it (after `trust proxy`). */
  address: string;
}

const storage = new AsyncLocalStorage<RequestContext>();

/**
 * Lets a password check deep in a service count failures per address without every caller
 * passing the request down. Registered after the body parsers, whose stream callbacks would
 * otherwise run outside the context.
 */
export function requestContextMiddleware(req: Request, _res: Response, next: NextFunction): void {
  storage.run({ address: clientAddress(req) }, next);
}

/** The current request's address, or null outside a request. */
export function currentAddress(): string | null {
  return storage.getStore()?.address ?? null;
}

/** IPv4 callers reach a dual-stack socket as `::ffff:a.b.c.d`; count them by the plain address. */
export function clientAddress(req: Request): string {
  const address = req.ip ?? req.socket.remoteAddress ?? 'unknown';
  return address.startsWith('::ffff:') ? address.slice(7) : address;
}
