import type { EntityManager } from 'typeorm';
import { type AuditEntry, recordAudit } from '../../audit/record-audit.js';
import type { User } from '../../users/entities/user.entity.js';

/** One step of the demo's back-story, so the seeded orders and libraries have an audit trail too. */
export type DemoAuditEntry = AuditEntry & { actor: User; at: Date };

/** Appends the entries to the audit chain oldest first, as if they had happened then. */
export async function recordDemoStory(manager: EntityManager, entries: DemoAuditEntry[]): Promise<void> {
  const inTimeOrder = [...entries].sort((a, b) => a.at.getTime() - b.at.getTime());
  for (const { actor, ...entry } of inTimeOrder) await recordAudit(manager, actor, entry);
}
