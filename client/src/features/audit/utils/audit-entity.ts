import type { AuditEntityType, AuditEvent, Role } from '@lockstep/shared';
import { canAccess } from '@/config/navigation';
import { paths } from '@/config/paths';

export const ENTITY_TYPE_LABELS: Record<AuditEntityType, string> = {
  order: 'Order',
  'library-version': 'Library version',
  user: 'User',
  ward: 'Ward',
  'sign-in': 'Sign-in lock',
  'equianalgesic-factor': 'Equianalgesic factor',
  patient: 'Patient',
};

type EntityRef = Pick<AuditEvent, 'entityType' | 'entityId'>;

/** "Order 14", or "Ward Harbour" when the ward's name is known. */
export function entityLabel(event: EntityRef, wardNames: ReadonlyMap<string, string> = new Map()): string {
  if (event.entityType === 'ward') {
    const name = wardNames.get(event.entityId);
    if (name) return `Ward ${name}`;
  }
  return `${ENTITY_TYPE_LABELS[event.entityType]} ${event.entityId}`;
}

/** The screen for the thing an event is about, when this role may open it; otherwise null. */
export function entityHref(event: EntityRef, role: Role): string | null {
  const id = Number(event.entityId);
  if (!Number.isSafeInteger(id) || id <= 0) return null;
  if (event.entityType === 'order' && canAccess(role, 'clinical')) return paths.order.getHref(id);
  if (event.entityType === 'ward' && canAccess(role, 'admin')) return paths.adminWardPolicies.getHref(id);
  if (event.entityType === 'patient' && canAccess(role, 'clinical')) return paths.patient.getHref(id);
  if (event.entityType === 'equianalgesic-factor' && canAccess(role, 'clinical')) return paths.equianalgesicFactors.getHref();
  return null;
}

/** Every event about the same thing, in the audit search. */
export function entitySearchHref(event: EntityRef): string {
  return paths.adminAudit.getHref({ entityType: event.entityType, entityId: event.entityId });
}

/** Enough of a SHA-256 hash to compare by eye. */
export function shortHash(hash: string): string {
  return hash.slice(0, 12);
}
