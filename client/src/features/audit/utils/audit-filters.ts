import {
  AUDIT_ACTIONS,
  AUDIT_ENTITY_TYPES,
  auditActionLabel,
  PHARMACY_AUDIT_ENTITY_TYPES,
  type AuditEntityType,
  type AuditQuery,
  type Role,
} from '@lockstep/shared';
import { ENTITY_TYPE_LABELS } from './audit-entity';

/** What the search form holds; the address holds the same, so a reload keeps it. */
export interface AuditFilters {
  entityType: AuditEntityType | null;
  entityId: string;
  userId: number | null;
  action: string | null;
  /** `datetime-local` values in the browser's time zone ("2026-03-03T09:05"), or ''. */
  from: string;
  to: string;
}

export const EMPTY_FILTERS: AuditFilters = { entityType: null, entityId: '', userId: null, action: null, from: '', to: '' };

export const AUDIT_PAGE_SIZE = 50;

const LOCAL_DATE_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2})?$/;

/** The entity types a role may search: the server refuses pharmacists anything else. */
export function entityTypesFor(role: Role): readonly AuditEntityType[] {
  return role === 'admin' ? AUDIT_ENTITY_TYPES : PHARMACY_AUDIT_ENTITY_TYPES;
}

export function actionEntityType(action: string): string {
  return action.split('.')[0] ?? '';
}

export interface ActionGroup {
  group: string;
  items: { value: string; label: string }[];
}

/** Actions to pick from, grouped by what they are about; only the chosen type's when one is chosen. */
export function actionOptions(types: readonly AuditEntityType[], entityType: AuditEntityType | null): ActionGroup[] {
  const shown = entityType ? [entityType] : types;
  return shown
    .map((type) => ({
      group: ENTITY_TYPE_LABELS[type],
      items: AUDIT_ACTIONS.filter((action) => actionEntityType(action) === type).map((action) => ({
        value: action,
        label: auditActionLabel(action),
      })),
    }))
    .filter((group) => group.items.length > 0);
}

function positiveInt(text: string | null): number | null {
  if (!text || !/^\d+$/.test(text)) return null;
  const value = Number(text);
  return Number.isSafeInteger(value) && value > 0 ? value : null;
}

function localDateTime(text: string | null): string {
  return text && LOCAL_DATE_TIME.test(text) ? text : '';
}

/** Reads the address; anything the role may not ask for, or cannot be read, is left out. */
export function filtersFromSearch(search: URLSearchParams, role: Role): { filters: AuditFilters; page: number } {
  const types = entityTypesFor(role);
  const type = search.get('entityType');
  const entityType = types.find((allowed) => allowed === type) ?? null;
  const action = search.get('action');
  const knownAction = AUDIT_ACTIONS.find((known) => known === action) ?? null;
  const actionAllowed = knownAction !== null && types.some((allowed) => allowed === actionEntityType(knownAction));
  return {
    filters: {
      entityType,
      entityId: (search.get('entityId') ?? '').trim(),
      userId: role === 'admin' ? positiveInt(search.get('userId')) : null,
      action: actionAllowed ? knownAction : null,
      from: localDateTime(search.get('from')),
      to: localDateTime(search.get('to')),
    },
    page: positiveInt(search.get('page')) ?? 1,
  };
}

/** The address for these filters and page; the first page and empty filters are left out. */
export function searchFromFilters(filters: AuditFilters, page = 1): Record<string, string | number | undefined> {
  return {
    entityType: filters.entityType ?? undefined,
    entityId: filters.entityId.trim() || undefined,
    userId: filters.userId ?? undefined,
    action: filters.action ?? undefined,
    from: filters.from || undefined,
    to: filters.to || undefined,
    page: page > 1 ? page : undefined,
  };
}

/** A `datetime-local` value (local time) as an ISO instant; `endOfMinute` makes "to 09:05" include 09:05:59. */
export function localDateTimeToIso(value: string, endOfMinute = false): string | undefined {
  if (!LOCAL_DATE_TIME.test(value)) return undefined;
  const date = new Date(value);
  if (Number.isNaN(date.getTime())) return undefined;
  if (endOfMinute && value.length === 16) date.setSeconds(59, 999);
  return date.toISOString();
}

export function toAuditQuery(filters: AuditFilters, page: number, pageSize = AUDIT_PAGE_SIZE): AuditQuery {
  const query: AuditQuery = { limit: pageSize, offset: (Math.max(page, 1) - 1) * pageSize };
  if (filters.entityType) query.entityType = filters.entityType;
  if (filters.entityId.trim()) query.entityId = filters.entityId.trim();
  if (filters.userId !== null) query.userId = filters.userId;
  if (filters.action) query.action = filters.action;
  const from = localDateTimeToIso(filters.from);
  const to = localDateTimeToIso(filters.to, true);
  if (from) query.from = from;
  if (to) query.to = to;
  return query;
}

/** Why the filters cannot be searched, per field; empty when they can. */
export function filterErrors(filters: AuditFilters): Partial<Record<keyof AuditFilters, string>> {
  const from = localDateTimeToIso(filters.from);
  const to = localDateTimeToIso(filters.to, true);
  if (from && to && from > to) return { to: 'The end is before the start' };
  return {};
}

export function pageCount(total: number, pageSize = AUDIT_PAGE_SIZE): number {
  return Math.max(1, Math.ceil(total / pageSize));
}
