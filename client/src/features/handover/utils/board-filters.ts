import type { HandoverRow } from '@lockstep/shared';

export interface BoardFilters {
  onlyFlagged: boolean;
  onlyOverdue: boolean;
}

export const NO_FILTERS: BoardFilters = { onlyFlagged: false, onlyOverdue: false };

export function hasOpenFlags(row: Pick<HandoverRow, 'flags'>): boolean {
  return row.flags.urgent + row.flags.review + row.flags.info > 0;
}

export function isOverdue(row: Pick<HandoverRow, 'nextObservation'>): boolean {
  return (row.nextObservation?.overdueMinutes ?? 0) > 0;
}

/** The rows the filters keep, in the server's risk order (never re-sorted here). */
export function filterRows<T extends Pick<HandoverRow, 'flags' | 'nextObservation'>>(rows: readonly T[], filters: BoardFilters): T[] {
  return rows.filter((row) => (!filters.onlyFlagged || hasOpenFlags(row)) && (!filters.onlyOverdue || isOverdue(row)));
}

export type RowSeverity = 'urgent' | 'review' | 'info' | 'routine';

/**
 * The row's overall severity, the highest of: its open flags, an overdue observation (the
 * server's own review/urgent), and a syringe that runs out within the shift (review).
 */
export function rowSeverity(row: Pick<HandoverRow, 'flags' | 'nextObservation' | 'syringe'>): RowSeverity {
  if (row.flags.urgent > 0 || row.nextObservation?.severity === 'urgent') return 'urgent';
  if (row.flags.review > 0 || row.nextObservation?.severity === 'review' || row.syringe.emptiesThisShift) return 'review';
  if (row.flags.info > 0) return 'info';
  return 'routine';
}

export interface SignoffProgress {
  confirmed: number;
  total: number;
}

/** Active PCAs confirmed this shift by both the outgoing and the incoming nurse. */
export function signoffProgress(rows: readonly Pick<HandoverRow, 'status' | 'signoffs'>[]): SignoffProgress {
  const active = rows.filter((row) => row.status === 'active');
  const confirmed = active.filter((row) => {
    const roles = new Set(row.signoffs.map((signoff) => signoff.role));
    return roles.has('outgoing') && roles.has('incoming');
  });
  return { confirmed: confirmed.length, total: active.length };
}

/** "3 of 5 PCAs confirmed", "1 of 1 PCA confirmed", "No active PCAs to confirm". */
export function signoffProgressText({ confirmed, total }: SignoffProgress): string {
  if (total === 0) return 'No active PCAs to confirm';
  return `${confirmed} of ${total} ${total === 1 ? 'PCA' : 'PCAs'} confirmed`;
}
