import { describe, expect, it } from 'vitest';
import { formatClock, formatClockSeconds, formatNearTime, formatSince, minutesSince, minutesUntil } from './clock';

const UTC = 'UTC';

describe('clock times', () => {
  it('reads clock times on the 24-hour clock', () => {
    expect(formatClock('2026-03-03T09:05:00.000Z', UTC)).toBe('09:05');
    expect(formatClock('2026-03-03T00:00:00.000Z', UTC)).toBe('00:00');
    expect(formatClock('2026-12-02T06:05:09.000Z', UTC)).toBe('06:05');
    expect(formatClock('2026-12-02T19:45:00.000Z', UTC)).toBe('19:45');
    expect(formatClockSeconds('2026-12-02T06:05:09.000Z', UTC)).toBe('06:05:09');
    expect(formatClock('2026-12-02T06:05:09.000Z', 'Pacific/Auckland')).toBe('19:05');
  });

  it('leaves what is not a time as it came, like formatDateTime', () => {
    expect(formatClock('not a time')).toBe('not a time');
  });

  it('gives a moment more than 12 hours away its date', () => {
    const now = new Date('2026-12-02T06:00:00.000Z');
    expect(formatNearTime('2026-12-02T14:20:00.000Z', now, UTC)).toBe('14:20');
    expect(formatNearTime('2026-12-01T22:00:00.000Z', now, UTC)).toBe('22:00');
    expect(formatNearTime('2026-12-06T06:05:57.177Z', now, UTC)).toBe('6 Dec 2026, 06:05');
  });

  it('says since when a task has waited: the time today, the date before that', () => {
    const now = new Date('2026-12-02T06:00:00.000Z');
    expect(formatSince('2026-12-02T05:10:51.420Z', now, UTC)).toBe('since 05:10');
    expect(formatSince('2026-11-30T05:10:00.000Z', now, UTC)).toBe('since 30 Nov 2026, 05:10');
    expect(formatSince('2026-12-01', now, UTC)).toBe('since 1 Dec 2026');
  });
});

describe('minutes between moments', () => {
  const now = new Date('2026-03-05T12:00:00Z');
  const ago = (minutes: number) => new Date(now.getTime() - minutes * 60_000).toISOString();

  it('counts whole minutes since, never negative, and reads nonsense as 0', () => {
    expect(minutesSince(ago(42.9), now)).toBe(42);
    expect(minutesSince(ago(-3), now)).toBe(0);
    expect(minutesSince('not a time', now)).toBe(0);
  });

  it('counts minutes until, negative once passed', () => {
    expect(minutesUntil(ago(-25), now)).toBe(25);
    expect(minutesUntil(ago(30), now)).toBe(-30);
  });
});
