import { createHash } from 'node:crypto';
import { ConflictException, Injectable, Logger, UnprocessableEntityException } from '@nestjs/common';
import { DataSource, type EntityManager, LessThan } from 'typeorm';
import { canonicalJson } from '../../audit/audit-hash.js';
import { fieldError } from '../errors/field-error.js';
import { IdempotencyKey } from './idempotency-key.entity.js';

/** The header's name (the IETF HTTP API working group's draft "The Idempotency-Key HTTP Header Field"). */
export const IDEMPOTENCY_KEY_HEADER = 'Idempotency-Key';
/** Set on an answer given from the store instead of by running the request again. */
export const IDEMPOTENT_REPLAYED_HEADER = 'Idempotent-Replayed';
/** 1 to 200 printable ASCII characters (a UUID is 36). */
const KEY_PATTERN = /^[\x20-\x7e]{1,200}$/;
/** How long a key is kept: a retry comes within seconds or minutes; a day covers a night shift's lost connection. */
export const IDEMPOTENCY_RETENTION_MS = 24 * 60 * 60 * 1000;
/** A repeat whose first request runs in another process (or was cut off by a crash) re-reads the row this often… */
const POLL_INTERVAL_MS = 50;
/** …for this long, then is told the first has not finished (409). */
const POLL_LIMIT_MS = 10_000;

/** What identifies a request besides its key: a key sent with anything else is refused (422). */
export type RequestFingerprint = { method: string; path: string; bodyHash: string };

/** A claimed key: the request runs, then `complete` stores its answer or `release` frees the key. */
export type IdempotencyClaim = { id: number; slot: string; finish: () => void };

export type IdempotencyOutcome = { kind: 'claimed'; claim: IdempotencyClaim } | { kind: 'replay'; status: number; body: unknown };

type ClaimAttempt = { kind: 'claimed'; id: number } | { kind: 'replay'; status: number; body: unknown } | { kind: 'running' };

/** The key from the header, or a 400 naming `Idempotency-Key`; undefined when it was not sent. */
export function parseIdempotencyKey(header: string | string[] | undefined): string | undefined {
  if (header === undefined) return undefined;
  if (typeof header !== 'string' || !KEY_PATTERN.test(header)) {
    throw fieldError(IDEMPOTENCY_KEY_HEADER, `The ${IDEMPOTENCY_KEY_HEADER} header is 1 to 200 printable characters, sent once`);
  }
  return header;
}

/**
 * SHA-256 of the body's canonical JSON (RFC 8785), with every field whose name contains "password"
 * left out, so no password's hash is kept. Two bodies that differ only in a password count as the
 * same request: the action they ask for is the same.
 */
export function bodyHash(body: unknown): string {
  return createHash('sha256')
    .update(canonicalJson(withoutPasswords(body)))
    .digest('hex');
}

function withoutPasswords(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(withoutPasswords);
  if (value === null || typeof value !== 'object' || value instanceof Date) return value;
  return Object.fromEntries(
    Object.entries(value)
      .filter(([name]) => !/password/i.test(name))
      .map(([name, inner]) => [name, withoutPasswords(inner)]),
  );
}

const sleep = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms));

/**
 * The replay store behind the `Idempotency-Key` header. A key belongs to one user. The first request
 * with it claims a row (in progress) in its own short transaction before the handler runs; its
 * answer is then stored (done), and a repeat of the same request gets that answer and writes
 * nothing. A failed request frees the key. While the first is running, a repeat in this process
 * waits on an in-memory promise (Lockstep runs one process on one SQLite file); a row in progress
 * that this process is not running (another process, or one cut off by a crash) is polled.
 */
@Injectable()
export class IdempotencyService {
  private readonly logger = new Logger(IdempotencyService.name);
  /** Requests with a claimed key running in this process, by user and key: a repeat awaits the promise. */
  private readonly inFlight = new Map<string, Promise<void>>();

  constructor(private readonly dataSource: DataSource) {}

  /** Claims the key for this request, or gives the stored answer of the same request sent earlier. */
  async begin(userId: number, key: string, request: RequestFingerprint): Promise<IdempotencyOutcome> {
    const slot = `${userId}\n${key}`;
    const started = Date.now();
    for (;;) {
      const running = this.inFlight.get(slot);
      if (running) {
        await running;
        continue;
      }
      // Taken synchronously, before any await, so no other request in this process gets past here with this key.
      let finish!: () => void;
      this.inFlight.set(slot, new Promise<void>((resolve) => (finish = resolve)));
      const done = () => {
        this.inFlight.delete(slot);
        finish();
      };
      let attempt: ClaimAttempt;
      try {
        attempt = await this.dataSource.transaction((manager) => this.claimOrRead(manager, userId, key, request));
      } catch (error) {
        done();
        throw error;
      }
      if (attempt.kind === 'claimed') return { kind: 'claimed', claim: { id: attempt.id, slot, finish: done } };
      done();
      if (attempt.kind === 'replay') return attempt;
      if (Date.now() - started > POLL_LIMIT_MS) {
        throw new ConflictException(
          `A request with this ${IDEMPOTENCY_KEY_HEADER} has not finished: look for its result before sending it again with a new key`,
        );
      }
      await sleep(POLL_INTERVAL_MS);
    }
  }

  /** Stores the answer, so repeats get it; then lets waiting repeats read it. */
  async complete(claim: IdempotencyClaim, status: number, body: unknown): Promise<void> {
    try {
      await this.dataSource.transaction((manager) =>
        manager.update(
          IdempotencyKey,
          { id: claim.id },
          { state: 'done', responseStatus: status, responseBody: body === undefined ? null : JSON.stringify(body) },
        ),
      );
    } catch (error) {
      // The write itself is committed: answer it. The key stays in progress, so a repeat is told
      // to look for the result (409) rather than writing twice.
      this.logger.error(`Could not store the answer for idempotency key #${claim.id}`, error instanceof Error ? error.stack : error);
    } finally {
      claim.finish();
    }
  }

  /** Frees the key of a request that failed, so a corrected retry with the same key runs. */
  async release(claim: IdempotencyClaim): Promise<void> {
    try {
      await this.dataSource.transaction((manager) => manager.delete(IdempotencyKey, { id: claim.id }));
    } catch (error) {
      this.logger.error(`Could not free idempotency key #${claim.id}`, error instanceof Error ? error.stack : error);
    } finally {
      claim.finish();
    }
  }

  private async claimOrRead(manager: EntityManager, userId: number, key: string, request: RequestFingerprint): Promise<ClaimAttempt> {
    const now = new Date();
    await manager.delete(IdempotencyKey, { createdAt: LessThan(new Date(now.getTime() - IDEMPOTENCY_RETENTION_MS)) });
    const earlier = await manager.findOneBy(IdempotencyKey, { userId, key });
    if (!earlier) {
      const row = await manager.save(
        manager.create(IdempotencyKey, {
          userId,
          key,
          ...request,
          state: 'in-progress',
          responseStatus: null,
          responseBody: null,
          createdAt: now,
        }),
      );
      return { kind: 'claimed', id: row.id };
    }
    if (earlier.method !== request.method || earlier.path !== request.path || earlier.bodyHash !== request.bodyHash) {
      throw new UnprocessableEntityException({
        statusCode: 422,
        message: `This ${IDEMPOTENCY_KEY_HEADER} was used for a different request: send a new key for a new request`,
        errors: [{ field: IDEMPOTENCY_KEY_HEADER, message: 'This key was used for a different request' }],
      });
    }
    if (earlier.state !== 'done' || earlier.responseStatus === null) return { kind: 'running' };
    return {
      kind: 'replay',
      status: earlier.responseStatus,
      body: earlier.responseBody === null ? undefined : (JSON.parse(earlier.responseBody) as unknown),
    };
  }
}
