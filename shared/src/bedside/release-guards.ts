import type { ReleaseStatus } from '../orders/order.schema.js';
import type { CheckStatus } from './bedside.schema.js';

/** A syringe that is still to be used or is running: the order's one open syringe. */
export const OPEN_RELEASE_STATUSES: readonly ReleaseStatus[] = ['ready', 'in_use'];

type ReleaseSeen = { releaseCode: string; status: ReleaseStatus };

/** The order's syringes that are ready or running, oldest first as given. */
export function openReleases<T extends ReleaseSeen>(releases: readonly T[]): T[] {
  return releases.filter((release) => OPEN_RELEASE_STATUSES.includes(release.status));
}

/**
 * Why a further syringe may not be released for an order, or null when it may. One ready or
 * running syringe per order keeps controlled drugs accounted for; a second needs the
 * pharmacist's reason (already checked as a reason of at least MIN_REASON_LENGTH characters).
 */
export function secondReleaseRefusal(releases: readonly ReleaseSeen[], secondSyringeReason: string | null | undefined): string | null {
  const open = openReleases(releases);
  if (open.length === 0 || (secondSyringeReason ?? '').trim().length > 0) return null;
  const named = open.map((release) => `${release.releaseCode} (${release.status === 'in_use' ? 'in use' : 'ready'})`).join(', ');
  return `This order already has syringe ${named}: give a reason to release a second`;
}

type CheckSeen = { id: number; releaseId: number; status: CheckStatus };

/** Why a first bedside check of this syringe may not start, or null: one pending check per syringe. */
export function pendingCheckRefusal(checks: readonly CheckSeen[], releaseId: number): string | null {
  const pending = checks.find((check) => check.releaseId === releaseId && check.status === 'awaiting_second');
  if (!pending) return null;
  return `A check of this syringe is already under way (check ${pending.id}, waiting for the second nurse): finish it before starting another`;
}
