import { describe, expect, it } from 'vitest';
import { isCalendarDay, isMoment } from './date-time.js';

// The formats the server's DTOs take (class-validator's @IsRFC3339, @IsISO8601 strict); the API
// tests check these against class-validator itself (server/test/request-parity.e2e-spec.ts).
describe('isMoment', () => {
  it('takes RFC 3339 with seconds and an offset', () => {
    for (const text of [
      '2030-01-02T12:00:00Z',
      '2030-01-02T12:00:00z',
      '2030-01-02 12:00:00.5+01:00',
      '2032-02-29T23:59:59.123456-05:30',
    ]) {
      expect(isMoment(text), text).toBe(true);
    }
  });

  it('refuses a moment without seconds or offset, a leap second, a lower-case t and days that do not exist', () => {
    for (const text of [
      '2030-01-02T12:00Z',
      '2030-01-02T12:00:00',
      '2030-01-02T12:00:00+0100',
      '2030-01-02T23:59:60Z',
      '2030-01-02t12:00:00Z',
      '2030-02-29T12:00:00Z',
      '2030-04-31T12:00:00Z',
      '2030-01-02',
    ]) {
      expect(isMoment(text), text).toBe(false);
    }
  });
});

describe('isCalendarDay', () => {
  it('takes a real day written yyyy-mm-dd', () => {
    expect(isCalendarDay('1968-03-14')).toBe(true);
    expect(isCalendarDay('2032-02-29')).toBe(true);
  });

  it('refuses other ISO 8601 forms and days that do not exist', () => {
    for (const text of ['2030-02-29', '2030-1-2', '2030-W01-1', '2030-001', '20300102', '1968-03-14T00:00:00Z', '']) {
      expect(isCalendarDay(text), text).toBe(false);
    }
  });
});
