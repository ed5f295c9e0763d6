import type { ObservationDue } from './observation-due.js';
import type { WardPolicy } from './ward-policy.js';

/**
 * What tightens the monitoring schedule. Each starts a period of close observation that ends only at
 * a reading taken after it, once its period has passed; a reading that raises an urgent flag raises
 * an 'urgent_flag' event after itself, so the schedule relaxes only after a reading without urgent flags.
 */
export const MONITORING_EVENT_KINDS = [
  'start',
  'loading_dose',
  'clinician_bolus',
  'regimen_change',
  'syringe_change',
  'urgent_flag',
  'naloxone',
] as const;
export type MonitoringEventKind = (typeof MONITORING_EVENT_KINDS)[number];

export type MonitoringEvent = { kind: MonitoringEventKind; at: string };

export type ScheduleInput = {
  /** The start (or the start of the regimen now running): the first-24-hours interval counts from it. */
  startedAt: string;
  /** Tightening events on this order, any order. */
  events: MonitoringEvent[];
  /** The latest observation's time, or null before the first one. */
  lastReadingAt: string | null;
};

const MINUTE = 60_000;

/** How long close observation lasts after an event of this kind, by the ward's policy. */
export function closePeriodMinutes(kind: MonitoringEventKind, policy: WardPolicy): number {
  if (kind === 'naloxone') return policy.naloxoneClosePeriodMinutes;
  // An urgent flag holds close observation until the next reading, whenever that is.
  if (kind === 'urgent_flag') return 0;
  return policy.closeObservationPeriodMinutes;
}

/** Events whose close observation is still running: no reading yet taken after the end of their period. */
export function openMonitoringEvents(input: Pick<ScheduleInput, 'events' | 'lastReadingAt'>, policy: WardPolicy): MonitoringEvent[] {
  const last = input.lastReadingAt === null ? null : Date.parse(input.lastReadingAt);
  return input.events.filter((event) => {
    const at = Date.parse(event.at);
    // A reading before or at the event (an urgent flag is raised by the reading it follows), or inside
    // its period, does not end it.
    return last === null || last <= at || last < at + closePeriodMinutes(event.kind, policy) * MINUTE;
  });
}

/**
 * When the next observation is due. Close observation (the ward's close interval, default every 15
 * minutes) runs from each tightening event until a reading taken after its period (default the first
 * hour; 2 hours after naloxone); then the ward's first-24-hours interval, then its usual interval.
 * The clock runs from the latest reading or event. Overdue is a review; more than one interval late is urgent.
 */
export function observationSchedule(
  input: ScheduleInput,
  now: Date,
  policy: WardPolicy,
): ObservationDue & { close: boolean; intervalMinutes: number } {
  const start = Date.parse(input.startedAt);
  const times = [start, ...input.events.map((event) => Date.parse(event.at))];
  if (input.lastReadingAt !== null) times.push(Date.parse(input.lastReadingAt));
  const from = Math.max(...times.filter((time) => Number.isFinite(time)));
  const close = openMonitoringEvents(input, policy).length > 0;
  const inFirstDay = from - start < 24 * 60 * MINUTE;
  const intervalMinutes = close
    ? policy.closeObservationIntervalMinutes
    : inFirstDay
      ? policy.observationIntervalFirst24hMinutes
      : policy.observationIntervalMinutes;
  const interval = intervalMinutes * MINUTE;
  const due = from + interval;
  const overdueMinutes = Math.max(0, Math.floor((now.getTime() - due) / MINUTE));
  const severity = overdueMinutes === 0 ? null : now.getTime() - due > interval ? 'urgent' : 'review';
  return { dueAt: new Date(due).toISOString(), overdueMinutes, severity, close, intervalMinutes };
}
