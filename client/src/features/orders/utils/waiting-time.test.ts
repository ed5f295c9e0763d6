import { describe, expect, it } from 'vitest';
import { formatWaitingTime, waitingMinutes } from './waiting-time';

const now = new Date('2026-03-05T12:00:00Z');
const ago = (minutes: number) => new Date(now.getTime() - minutes * 60_000).toISOString();

describe('waiting time', () => {
  it('counts whole minutes', () => {
    expect(waitingMinutes(ago(42.9), now)).toBe(42);
    expect(formatWaitingTime(ago(42), now)).toBe('42 min');
    expect(formatWaitingTime(ago(0.5), now)).toBe('under 1 min');
  });

  it('uses hours from 60 minutes and days from 24 hours', () => {
    expect(formatWaitingTime(ago(60), now)).toBe('1 h');
    expect(formatWaitingTime(ago(185), now)).toBe('3 h 5 min');
    expect(formatWaitingTime(ago(24 * 60), now)).toBe('1 d');
    expect(formatWaitingTime(ago(2 * 24 * 60 + 4 * 60 + 30), now)).toBe('2 d 4 h');
  });

  it('never goes negative when a clock runs ahead, and reads nonsense as 0', () => {
    expect(formatWaitingTime(ago(-3), now)).toBe('under 1 min');
    expect(formatWaitingTime('not a time', now)).toBe('under 1 min');
  });
});
