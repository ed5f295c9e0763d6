import { z } from 'zod';
import type { WardPolicy } from './ward-policy.js';

export const observationDueSchema = z.object({
  dueAt: z.string(),
  overdueMinutes: z.number(),
  severity: z.enum(['review', 'urgent']).nullable(),
});
export type ObservationDue = z.infer<typeof observationDueSchema>;

const MINUTE = 60_000;

/**
 * When the next observation is due: the ward's first-24-hours interval after a start or regimen
 * change, the usual interval after that. Overdue is a review; more than one interval late is urgent.
 */
export function observationDue(startedAt: string, lastObservationAt: string | null, now: Date, policy: WardPolicy): ObservationDue {
  const start = Date.parse(startedAt);
  const last = lastObservationAt ? Date.parse(lastObservationAt) : start;
  const inFirstDay = last - start < 24 * 60 * MINUTE;
  const interval = (inFirstDay ? policy.observationIntervalFirst24hMinutes : policy.observationIntervalMinutes) * MINUTE;
  const due = last + interval;
  const overdueMinutes = Math.max(0, Math.floor((now.getTime() - due) / MINUTE));
  const severity = overdueMinutes === 0 ? null : now.getTime() - due > interval ? 'urgent' : 'review';
  return { dueAt: new Date(due).toISOString(), overdueMinutes, severity };
}
