import { describe, expect, it } from 'vitest';
import { formatCalendarDate } from './format-date';

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
