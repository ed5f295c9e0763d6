import { useCallback, useState } from 'react';

export interface IdempotencyKey {
  /** Sent as the write's `Idempotency-Key` header; the same for a double-click or a retry. */
  key: string;
  /** A new key for the next record, after the server has recorded this one. */
  renew: () => void;
}

/**
 * One `Idempotency-Key` per opening of a form: made when the form mounts and kept across
 * re-renders, so a second click or a retry after a lost answer is the same request and the
 * server records it once. Call `renew` after a success when the form stays open for another
 * record; a new opening of the form gets a new key by itself. A refused request (4xx) keeps the
 * key: the corrected form is still the same action.
 */
export function useIdempotencyKey(): IdempotencyKey {
  const [key, setKey] = useState(newIdempotencyKey);
  const renew = useCallback(() => setKey(newIdempotencyKey()), []);
  return { key, renew };
}

export function newIdempotencyKey(): string {
  return crypto.randomUUID();
}
