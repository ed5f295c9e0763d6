import type { AuditEvent as AuditEventResponse } from '@lockstep/shared';
import type { AuditEvent } from '../entities/audit-event.entity.js';

export function toAuditEventResponse(event: AuditEvent): AuditEventResponse {
  return {
    id: event.id,
    at: event.at,
    userId: event.userId,
    actorName: event.actorName,
    action: event.action,
    entityType: event.entityType,
    entityId: event.entityId,
    summary: JSON.parse(event.summary) as Record<string, unknown>,
    prevHash: event.prevHash,
    hash: event.hash,
  };
}
