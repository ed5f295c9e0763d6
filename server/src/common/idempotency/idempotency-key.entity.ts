import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Where a claimed key stands: its request is still running, or it answered and the answer is kept. */
export type IdempotencyKeyState = 'in-progress' | 'done';

/**
 * One `Idempotency-Key` a user sent with a POST (see idempotency.interceptor.ts): claimed before the
 * handler runs, then holding the status and JSON body it answered, which a repeat of the same
 * request with the same key gets back instead of a second write. A request that fails (4xx/5xx)
 * deletes its row, so a corrected retry with the same key runs. Rows older than 24 hours are
 * deleted when a new key is claimed.
 */
@Entity('idempotency_keys')
@Index('IDX_idempotency_keys_user_key', ['userId', 'key'], { unique: true })
export class IdempotencyKey {
  @PrimaryGeneratedColumn()
  id: number;

  /** The signed-in user who sent it: keys are per user, so two users' keys never meet. */
  @Column({ type: 'integer' })
  userId: number;

  @Column({ type: 'varchar', length: 200 })
  key: string;

  @Column({ type: 'varchar', length: 10 })
  method: string;

  /** The request's path and query, as sent (`/api/orders/12/boluses`). */
  @Column({ type: 'varchar', length: 2000 })
  path: string;

  /** SHA-256 (hex) of the body's canonical JSON with any password left out. */
  @Column({ type: 'varchar', length: 64 })
  bodyHash: string;

  @Column({ type: 'varchar', length: 12 })
  state: IdempotencyKeyState;

  /** The answer's status code, once done. */
  @Column({ type: 'integer', nullable: true })
  responseStatus: number | null;

  /** The answer's JSON body, once done (null for an empty answer). */
  @Column({ type: 'text', nullable: true })
  responseBody: string | null;

  @Index('IDX_idempotency_keys_created')
  @Column({ type: 'datetime' })
  createdAt: Date;
}
