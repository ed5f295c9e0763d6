import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';

/** The chain starts from this "previous hash". */
export const GENESIS_HASH = '0'.repeat(64);

export type HashedContent = {
  id: number;
  at: string;
  userId: number | null;
  actorName: string | null;
  action: string;
  entityType: string;
  entityId: string;
  summary: string;
};

/** SHA-256 over the previous hash and the canonical JSON (RFC 8785) of the event's content. */
export function auditHash(prevHash: string, content: HashedContent): string {
  return createHash('sha256').update(prevHash).update(canonicalJson(content)).digest('hex');
}

/** Keys sorted, no whitespace: the same value always gives the same text. Dates become ISO strings. */
export function canonicalJson(value: unknown): string {
  return canonicalize(JSON.parse(JSON.stringify(value ?? null))) ?? 'null';
}
