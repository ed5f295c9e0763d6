import { describe, expect, it } from 'vitest';
import { formatCalendarDate, formatDateTime } from './format-date';

describe('formatCalendarDate', () => {
  it('writes the month in words, without a leading zero on the day', () => {
    expect(formatCalendarDate('1950-03-05')).toBe('5 Mar 1950');
    expect(formatCalendarDate('2016-12-31')).toBe('31 Dec 2016');
  });

  it('ignores a time part and never shifts the day', () => {
    expect(formatCalendarDate('1988-01-01T23:30:00Z')).toBe('1 Jan 1988');
  });

  it('returns anything it cannot read unchanged', () => {
    expect(formatCalendarDate('unknown')).toBe('unknown');
    expect(formatCalendarDate('1950-13-01')).toBe('1950-13-01');
  });
});

describe('formatDateTime', () => {
  it('writes day, month in words, year and a 24-hour time in the zone given', () => {
    expect(formatDateTime('2026-03-03T09:05:00.000Z', 'UTC')).toBe('3 Mar 2026, 09:05');
    expect(formatDateTime('2026-09-30T23:59:00.000Z', 'UTC')).toBe('30 Sep 2026, 23:59');
    expect(formatDateTime('2026-01-01T00:30:00.000Z', 'UTC')).toBe('1 Jan 2026, 00:30');
  });

  it('follows the zone across midnight', () => {
    expect(formatDateTime('2026-03-03T23:30:00.000Z', 'Asia/Tokyo')).toBe('4 Mar 2026, 08:30');
  });

  it('returns anything it cannot read unchanged', () => {
    expect(formatDateTime('not a date')).toBe('not a date');
  });
});
