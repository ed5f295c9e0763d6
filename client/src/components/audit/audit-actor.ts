import type { AuditEvent } from '@lockstep/shared';

/** Who did it: the name recorded with the event; "Lockstep" for the system itself. */
export function actorText(event: Pick<AuditEvent, 'actorName' | 'userId'>): string {
  if (event.actorName) return event.actorName;
  return event.userId === null ? 'Lockstep (automatic)' : `User ${event.userId}`;
}
