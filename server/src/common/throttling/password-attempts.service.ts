import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Env } from '../../config/env.validation.js';
import { currentAddress } from '../request-context/request-context.js';
import { FailureCounter } from './failure-counter.js';
import { minutesText, TooManyAttemptsException } from './too-many-attempts.exception.js';
import { type Lockout } from '@lockstep/shared';

/**
 * Counts wrong passwords per username and per network address, for sign-in, signatures and a
 * colleague signing on the same screen alike, and refuses further checks (429) at the limit.
 * Kept in memory: a restart forgets the counts, which only ever helps a locked-out nurse.
 */
@Injectable()
export class PasswordAttemptsService {
  private readonly logger = new Logger('PasswordAttempts');
  private readonly byUsername: FailureCounter;
  private readonly byAddress: FailureCounter;
  private lastSweep = 0;

  constructor(config: ConfigService<Env, true>) {
    const windowMs = config.get('SIGN_IN_LOCKOUT_MINUTES', { infer: true }) * 60_000;
    this.byUsername = new FailureCounter(config.get('SIGN_IN_MAX_FAILURES_PER_USERNAME', { infer: true }), windowMs);
    this.byAddress = new FailureCounter(config.get('SIGN_IN_MAX_FAILURES_PER_ADDRESS', { infer: true }), windowMs);
  }

  /**
   * Runs one password check under the limits; a falsy result is a failure. The attempt is counted
   * before `verify` runs and taken back if it passes, so a burst of parallel guesses cannot slip
   * past the limit. A pass clears the username's count (not the address's: an attacker could
   * otherwise reset it with an account of their own).
   */
  async check<T>(username: string | undefined, verify: () => Promise<T>): Promise<T> {
    const shown = username?.trim() || null;
    const name = shown?.toLowerCase() ?? null;
    const address = currentAddress();
    const now = Date.now();
    this.sweep(now);
    this.refuseIfLocked(shown, name, address, now);

    if (name) this.byUsername.add(name, now);
    if (address) this.byAddress.add(address, now);
    let result: T;
    try {
      result = await verify();
    } catch (error) {
      this.takeBack(name, address, now);
      throw error;
    }
    if (result) {
      if (name) this.byUsername.clear(name);
      if (address) this.byAddress.remove(address, now);
    } else {
      this.warnIfNowLocked(name, address, Date.now());
    }
    return result;
  }

  lockouts(): Lockout[] {
    const now = Date.now();
    const list = (kind: Lockout['kind'], counter: FailureCounter): Lockout[] =>
      counter
        .locked(now)
        .map(({ key, failures, retryAfterMs }) => ({ kind, key, failures, retryAfterSeconds: Math.ceil(retryAfterMs / 1000) }));
    return [...list('username', this.byUsername), ...list('address', this.byAddress)];
  }

  /** An admin's unlock; true when there was something to clear. */
  clear(kind: Lockout['kind'], key: string): boolean {
    return kind === 'username' ? this.byUsername.clear(key.trim().toLowerCase()) : this.byAddress.clear(key.trim());
  }

  private refuseIfLocked(shown: string | null, name: string | null, address: string | null, now: number): void {
    const forName = name ? this.byUsername.retryAfterMs(name, now) : 0;
    if (forName > 0) {
      throw new TooManyAttemptsException(
        `Too many wrong passwords for ${shown}. Wait ${minutesText(forName)} and try again, or ask an admin to unlock the account.`,
        Math.ceil(forName / 1000),
      );
    }
    const forAddress = address ? this.byAddress.retryAfterMs(address, now) : 0;
    if (forAddress > 0) {
      throw new TooManyAttemptsException(
        `Too many wrong passwords from this computer. Wait ${minutesText(forAddress)} and try again, or ask an admin to unlock it.`,
        Math.ceil(forAddress / 1000),
      );
    }
  }

  private takeBack(name: string | null, address: string | null, at: number): void {
    if (name) this.byUsername.remove(name, at);
    if (address) this.byAddress.remove(address, at);
  }

  private warnIfNowLocked(name: string | null, address: string | null, now: number): void {
    if (name && this.byUsername.retryAfterMs(name, now) > 0)
      this.logger.warn('Username locked after wrong passwords', { username: name, address });
    if (address && this.byAddress.retryAfterMs(address, now) > 0) this.logger.warn('Address locked after wrong passwords', { address });
  }

  private sweep(now: number): void {
    if (now - this.lastSweep < 60_000) return;
    this.lastSweep = now;
    this.byUsername.sweep(now);
    this.byAddress.sweep(now);
  }
}
