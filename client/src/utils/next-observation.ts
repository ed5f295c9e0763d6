import type { ObservationDue } from '@lockstep/shared';
import { formatClock, formatMinutes, minutesUntil } from './clock';
import { formatDateTime } from './format-date';

/** A nearby moment as its time of day; one further off with its date, so the day is never in doubt. */
export function formatMoment(isoTimestamp: string, now: Date, timeZone?: string): string {
  return Math.abs(minutesUntil(isoTimestamp, now)) < 12 * 60 ? formatClock(isoTimestamp, timeZone) : formatDateTime(isoTimestamp, timeZone);
}

export type DueState = { tone: 'ok' | 'review' | 'urgent'; headline: string; detail: string };

/** "Next observation due at 14:05 (in 25 min)", or overdue as review / urgent. */
export function describeNextObservation(due: ObservationDue, now: Date, timeZone?: string): DueState {
  const at = formatMoment(due.dueAt, now, timeZone);
  if (due.severity === null || due.overdueMinutes === 0) {
    const minutes = Math.max(0, minutesUntil(due.dueAt, now));
    return { tone: 'ok', headline: `Due at ${at}`, detail: minutes === 0 ? 'Due now' : `In ${formatMinutes(minutes)}` };
  }
  return {
    tone: due.severity,
    headline: `Overdue by ${formatMinutes(due.overdueMinutes)}`,
    detail: due.severity === 'urgent' ? `Was due at ${at}: more than one interval late` : `Was due at ${at}`,
  };
}
