import type { Shift } from './handover.schema.js';

/**
 * The shift a moment falls in, from the ward's day-shift start and night-shift start ("07:00",
 * "19:00", ward-local clock given as minutes east of UTC). A night shift is dated by its start.
 */
export function shiftWindow(
  now: Date,
  dayStart: string,
  nightStart: string,
  utcOffsetMinutes = 0,
): { shift: Shift; shiftDate: string; startsAt: string; endsAt: string } {
  const minutes = (text: string) => {
    const [h, m] = text.split(':').map(Number);
    return h * 60 + m;
  };
  const day = minutes(dayStart);
  const night = minutes(nightStart);
  const local = new Date(now.getTime() + utcOffsetMinutes * 60_000);
  const midnight = Date.UTC(local.getUTCFullYear(), local.getUTCMonth(), local.getUTCDate());
  const minuteOfDay = local.getUTCHours() * 60 + local.getUTCMinutes();
  const toUtc = (localMs: number) => new Date(localMs - utcOffsetMinutes * 60_000).toISOString();
  const at = (base: number, minute: number) => base + minute * 60_000;
  const DAY = 24 * 60 * 60_000;

  if (minuteOfDay >= day && minuteOfDay < night) {
    return {
      shift: 'day',
      shiftDate: new Date(midnight).toISOString().slice(0, 10),
      startsAt: toUtc(at(midnight, day)),
      endsAt: toUtc(at(midnight, night)),
    };
  }
  const startBase = minuteOfDay >= night ? midnight : midnight - DAY;
  return {
    shift: 'night',
    shiftDate: new Date(startBase).toISOString().slice(0, 10),
    startsAt: toUtc(at(startBase, night)),
    endsAt: toUtc(at(startBase + DAY, day)),
  };
}
