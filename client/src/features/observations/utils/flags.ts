import type { FlagResponse, FlagSeverity } from '@lockstep/shared';

const SEVERITY_RANK: Record<FlagSeverity, number> = { urgent: 0, review: 1, info: 2 };

export function bySeverityThenNewest<T extends Pick<FlagResponse, 'severity'> & { raisedAt?: string }>(a: T, b: T): number {
  const rank = SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity];
  if (rank !== 0) return rank;
  return Date.parse(b.raisedAt ?? '') - Date.parse(a.raisedAt ?? '') || 0;
}

export interface SplitFlags {
  /** Still to act on: urgent first, then review, then info; newest first within each. */
  open: FlagResponse[];
  /** Newest acknowledgement first. */
  acknowledged: FlagResponse[];
}

export function splitFlags(flags: readonly FlagResponse[]): SplitFlags {
  const open = flags.filter((flag) => flag.acknowledgedAt === null).sort(bySeverityThenNewest);
  const acknowledged = flags
    .filter((flag) => flag.acknowledgedAt !== null)
    .sort((a, b) => Date.parse(b.acknowledgedAt ?? '') - Date.parse(a.acknowledgedAt ?? ''));
  return { open, acknowledged };
}

export const MIN_ACKNOWLEDGE_NOTE = 5;

/** The note says what was done; the server asks for at least 5 characters. */
export function acknowledgeNoteError(note: string): string | null {
  const length = note.trim().length;
  if (length === 0) return 'Say what was done about the flag';
  if (length < MIN_ACKNOWLEDGE_NOTE) return `Say what was done (at least ${MIN_ACKNOWLEDGE_NOTE} characters)`;
  if (length > 1000) return 'The note is at most 1,000 characters';
  return null;
}
