import type { ObservationDue } from '@lockstep/shared';
import { formatNearTime, minutesUntil } from './clock';
import { formatMinutes } from './duration';

export type DueState = { tone: 'ok' | 'review' | 'urgent'; headline: string; detail: string };

/** "Next observation due at 14:05 (in 25 min)", or overdue as review / urgent. */
export function describeNextObservation(due: ObservationDue, now: Date, timeZone?: string): DueState {
  const at = formatNearTime(due.dueAt, now, timeZone);
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
