/** "14:05" in the browser's time zone (or the one given), 24-hour clock. */
export function formatClock(isoTimestamp: string, timeZone?: string): string {
  const date = new Date(isoTimestamp);
  if (Number.isNaN(date.getTime())) return isoTimestamp;
  const parts = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone }).formatToParts(date);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('hour')}:${part('minute')}`;
}

/** A span of minutes as "45 min", "2 h" or "3 h 10 min". */
export function formatMinutes(totalMinutes: number): string {
  const minutes = Math.max(0, Math.round(totalMinutes));
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}

/** Whole minutes from `now` until `isoTimestamp` (negative when it has passed). */
export function minutesUntil(isoTimestamp: string, now: Date): number {
  return Math.round((Date.parse(isoTimestamp) - now.getTime()) / 60_000);
}
