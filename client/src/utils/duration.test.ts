import { describe, expect, it } from 'vitest';
import { minutesSince } from './clock';
import { formatElapsed, formatMinutes } from './duration';

describe('spans', () => {
  it('writes spans in hours and minutes', () => {
    expect(formatMinutes(45)).toBe('45 min');
    expect(formatMinutes(120)).toBe('2 h');
    expect(formatMinutes(190)).toBe('3 h 10 min');
  });

  it('writes elapsed time in minutes, hours and days', () => {
    expect(formatElapsed(0)).toBe('under 1 min');
    expect(formatElapsed(45)).toBe('45 min');
    expect(formatElapsed(60)).toBe('1 h');
    expect(formatElapsed(185)).toBe('3 h 5 min');
    expect(formatElapsed(24 * 60)).toBe('1 d');
    expect(formatElapsed(52 * 60 + 10)).toBe('2 d 4 h');
    expect(formatElapsed(-3)).toBe('under 1 min');
  });
});

describe('waiting time (elapsed since a moment)', () => {
  const now = new Date('2026-03-05T12:00:00Z');
  const ago = (minutes: number) => new Date(now.getTime() - minutes * 60_000).toISOString();
  const waiting = (since: string) => formatElapsed(minutesSince(since, now));

  it('counts whole minutes', () => {
    expect(waiting(ago(42))).toBe('42 min');
    expect(waiting(ago(0.5))).toBe('under 1 min');
  });

  it('uses hours from 60 minutes and days from 24 hours', () => {
    expect(waiting(ago(60))).toBe('1 h');
    expect(waiting(ago(185))).toBe('3 h 5 min');
    expect(waiting(ago(24 * 60))).toBe('1 d');
    expect(waiting(ago(2 * 24 * 60 + 4 * 60 + 30))).toBe('2 d 4 h');
  });

  it('never goes negative when a clock runs ahead, and reads nonsense as 0', () => {
    expect(waiting(ago(-3))).toBe('under 1 min');
    expect(waiting('not a time')).toBe('under 1 min');
  });
});
