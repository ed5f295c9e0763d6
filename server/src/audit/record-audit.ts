import type { EntityManager } from 'typeorm';
import type { AuditAction, AuditEntityType } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { auditHash, canonicalJson, GENESIS_HASH } from './audit-hash.js';
import { AuditEvent } from './entities/audit-event.entity.js';

export type AuditEntry = {
  action: AuditAction;
  entityType: AuditEntityType;
  entityId: number | string;
  /** What changed: `{ field: { from, to } }` for edits, key values for new records. Never secrets. */
  summary: Record<string, unknown>;
  /** When it happened; now unless given. Only the demo seed tells an earlier story. */
  at?: Date;
};

/**
 * Appends one event to the audit chain. Call it inside the transaction that makes the change, so
 * the change and its record commit or roll back together. Transactions are queued one at a time
 * (database/serial-transactions.ts), so reading the chain's tail here cannot race another writer.
 */
export async function recordAudit(
  manager: EntityManager,
  actor: Pick<AuthUser, 'id' | 'displayName'> | null,
  entry: AuditEntry,
): Promise<void> {
  const tail = await manager.findOne(AuditEvent, { where: {}, order: { id: 'DESC' }, select: { id: true, hash: true } });
  const content = {
    id: (tail?.id ?? 0) + 1,
    at: (entry.at ?? new Date()).toISOString(),
    userId: actor?.id ?? null,
    actorName: actor?.displayName ?? null,
    action: entry.action,
    entityType: entry.entityType,
    entityId: String(entry.entityId),
    summary: canonicalJson(entry.summary),
  };
  const prevHash = tail?.hash ?? GENESIS_HASH;
  await manager.insert(AuditEvent, { ...content, prevHash, hash: auditHash(prevHash, content) });
}

/** `{ field: { from, to } }` for each listed field whose value differs. */
export function changedFields<T extends object>(
  before: T,
  after: Partial<T>,
  fields: readonly (keyof T)[] = Object.keys(after) as (keyof T)[],
): Record<string, { from: unknown; to: unknown }> {
  const changes: Record<string, { from: unknown; to: unknown }> = {};
  for (const field of fields) {
    if (!(field in after) || after[field] === undefined) continue;
    const from = before[field];
    const to = after[field];
    if (canonicalJson(from) !== canonicalJson(to)) changes[String(field)] = { from: from ?? null, to: to ?? null };
  }
  return changes;
}
