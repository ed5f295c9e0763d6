import { formatCalendarDate, formatDateTime } from './format-date';

const MINUTE_MS = 60_000;
const NEAR_MS = 12 * 60 * MINUTE_MS;
const DAY_MS = 24 * 60 * MINUTE_MS;

function clockTime(isoTimestamp: string, timeZone: string | undefined, withSeconds: boolean): string {
  const date = new Date(isoTimestamp);
  if (Number.isNaN(date.getTime())) return isoTimestamp;
  const parts = new Intl.DateTimeFormat('en-GB', {
    hour: '2-digit',
    minute: '2-digit',
    ...(withSeconds ? { second: '2-digit' } : {}),
    hourCycle: 'h23',
    timeZone,
  }).formatToParts(date);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return withSeconds ? `${part('hour')}:${part('minute')}:${part('second')}` : `${part('hour')}:${part('minute')}`;
}

/** "14:05" in the browser's time zone (or the one given), 24-hour clock. */
export function formatClock(isoTimestamp: string, timeZone?: string): string {
  return clockTime(isoTimestamp, timeZone, false);
}

/** "06:40:05", for the board's "Updated" time. */
export function formatClockSeconds(isoTimestamp: string, timeZone?: string): string {
  return clockTime(isoTimestamp, timeZone, true);
}

/**
 * A moment near `now` (within 12 hours either way) as its clock time, "06:05"; a farther one with
 * its date, "6 Dec 2026, 06:05", so a projection days ahead never reads as later today.
 */
export function formatNearTime(isoTimestamp: string, now: Date, timeZone?: string): string {
  const at = Date.parse(isoTimestamp);
  if (Number.isNaN(at)) return '—';
  return Math.abs(at - now.getTime()) < NEAR_MS ? formatClock(isoTimestamp, timeZone) : formatDateTime(isoTimestamp, timeZone);
}

/**
 * "since 05:10" within the last day, "since 1 Dec 2026, 05:10" before it; a calendar date (the
 * review date) as "since 1 Dec 2026".
 */
export function formatSince(since: string, now: Date, timeZone?: string): string {
  if (/^\d{4}-\d{2}-\d{2}$/.test(since)) return `since ${formatCalendarDate(since)}`;
  const at = Date.parse(since);
  if (Number.isNaN(at)) return '';
  if (now.getTime() - at < DAY_MS) return `since ${formatClock(since, timeZone)}`;
  return `since ${formatDateTime(since, timeZone)}`;
}

/** Whole minutes from `now` until `isoTimestamp` (negative when it has passed). */
export function minutesUntil(isoTimestamp: string, now: Date): number {
  return Math.round((Date.parse(isoTimestamp) - now.getTime()) / MINUTE_MS);
}

/** Whole minutes from `since` to `now`, never negative (a clock a little ahead reads 0); nonsense reads 0. */
export function minutesSince(since: string, now: Date): number {
  const start = Date.parse(since);
  if (Number.isNaN(start)) return 0;
  return Math.max(0, Math.floor((now.getTime() - start) / MINUTE_MS));
}
