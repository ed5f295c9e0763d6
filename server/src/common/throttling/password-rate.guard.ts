import { type ExecutionContext, Injectable } from '@nestjs/common';
import { ThrottlerGuard, type ThrottlerLimitDetail } from '@nestjs/throttler';
import type { Request } from 'express';
import { clientAddress } from '../request-context/request-context.js';
import { TooManyAttemptsException } from './too-many-attempts.exception.js';

/**
 * Global, but only for requests that carry a password: sign-in, a signature
 * (`signature.password`), a colleague signing on the same screen (`password`,
 * `witness.password`), an admin setting one. Each costs a deliberately slow bcrypt check, so one
 * address may send only so many a minute, right or wrong, across all routes together.
 */
@Injectable()
export class PasswordRateGuard extends ThrottlerGuard {
  protected override async shouldSkip(context: ExecutionContext): Promise<boolean> {
    if (context.getType() !== 'http') return true;
    return !carriesPassword(context.switchToHttp().getRequest<Request>().body);
  }

  protected override async getTracker(req: Record<string, unknown>): Promise<string> {
    return clientAddress(req as unknown as Request);
  }

  // One bucket per address for every route, not one per route.
  protected override generateKey(_context: ExecutionContext, tracker: string, name: string): string {
    return `password-requests:${name}:${tracker}`;
  }

  protected override async throwThrottlingException(_context: ExecutionContext, detail: ThrottlerLimitDetail): Promise<void> {
    const seconds = Math.max(1, detail.timeToBlockExpire);
    throw new TooManyAttemptsException(
      `Too many sign-ins and signatures from this computer in a short time. Wait ${seconds} seconds and try again.`,
      seconds,
    );
  }
}

/** A `password` field at the top level or one level down (`signature`, `witness`). */
export function carriesPassword(body: unknown): boolean {
  if (!body || typeof body !== 'object') return false;
  return Object.entries(body).some(
    ([key, value]) => key === 'password' || (value !== null && typeof value === 'object' && 'password' in value),
  );
}
