import { z } from 'zod';
import { must } from './request-rules.js';

// The date formats the server's DTOs take, as class-validator checks them (validator.js 13):
// @IsRFC3339 with @IsISO8601({ strict: true }) for a moment, @Matches(yyyy-mm-dd) with
// @IsISO8601({ strict: true }) for a day.

/** RFC 3339 date-time with seconds and an offset, also strict ISO 8601 (so a `T` or a space, and no leap second). */
const MOMENT = /^\d{4}-(0[1-9]|1[0-2])-([12]\d|0[1-9]|3[01])[T ]([01]\d|2[0-3]):[0-5]\d:[0-5]\d(\.\d+)?([zZ]|[+-]([01]\d|2[0-3]):[0-5]\d)$/;
const DAY = /^\d{4}-(0[1-9]|1[0-2])-([12]\d|0[1-9]|3[01])$/;

/** validator.js's own check that the day exists (no 30 February), read the way it reads it. */
function isRealDay(text: string): boolean {
  const [, year, month, day] = (/(\d{4})-?(\d{0,2})-?(\d*)/.exec(text) ?? []).map(Number);
  const pad = (n: number) => `0${n}`.slice(-2);
  const date = new Date(`${year}-${pad(month)}-${pad(day)}`);
  return date.getUTCFullYear() === year && date.getUTCMonth() + 1 === month && date.getUTCDate() === day;
}

/** A real moment written as RFC 3339 with seconds and an offset, e.g. `2030-01-02T12:00:00Z`. */
export function isMoment(text: string): boolean {
  return MOMENT.test(text) && isRealDay(text);
}

/** A real day written `yyyy-mm-dd`. */
export function isCalendarDay(text: string): boolean {
  return DAY.test(text) && isRealDay(text);
}

/** @IsDefined, then @IsRFC3339 and @IsISO8601({ strict: true }) with one message. */
export const momentSchema = (required: string, wrong: string) => z.string(must(required, wrong)).refine(isMoment, wrong);

/** @IsDefined, then @IsISO8601({ strict: true }) and @Matches(yyyy-mm-dd) with one message. */
export const calendarDaySchema = (required: string, wrong: string) => z.string(must(required, wrong)).refine(isCalendarDay, wrong);
