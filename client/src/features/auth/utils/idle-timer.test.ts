import { describe, expect, it } from 'vitest';
import { formatCountdown, formatIdleDuration, idleState, idleTiming } from './idle-timer';

const MINUTE = 60_000;
const start = Date.parse('2026-03-05T08:00:00Z');
const at = (minutes: number) => start + minutes * MINUTE;

describe('idle timing', () => {
  it('warns a minute before a 15-minute sign-out', () => {
    expect(idleTiming(15)).toEqual({ timeoutMs: 15 * MINUTE, warningMs: MINUTE });
  });

  it('warns halfway through a timeout under two minutes', () => {
    expect(idleTiming(1)).toEqual({ timeoutMs: MINUTE, warningMs: 30_000 });
    expect(idleTiming(1.5)).toEqual({ timeoutMs: 90_000, warningMs: 45_000 });
  });
});

describe('idleState', () => {
  const timing = idleTiming(15);

  it('is active until 14 minutes without activity', () => {
    expect(idleState(start, start, timing)).toEqual({ phase: 'active', msLeft: 15 * MINUTE });
    expect(idleState(start, at(13.99), timing).phase).toBe('active');
  });

  it('warns from 14 minutes, counting down', () => {
    expect(idleState(start, at(14), timing)).toEqual({ phase: 'warning', msLeft: MINUTE });
    expect(idleState(start, at(14) + 5_000, timing)).toEqual({ phase: 'warning', msLeft: 55_000 });
  });

  it('expires at 15 minutes, and at once after a computer slept through it', () => {
    expect(idleState(start, at(15), timing)).toEqual({ phase: 'expired', msLeft: 0 });
    expect(idleState(start, at(600), timing)).toEqual({ phase: 'expired', msLeft: 0 });
  });

  it('starts again from fresh activity, and ignores a clock that went back', () => {
    expect(idleState(at(14.5), at(15), timing).phase).toBe('active');
    expect(idleState(at(5), at(1), timing)).toEqual({ phase: 'active', msLeft: 15 * MINUTE });
  });
});

describe('formatting', () => {
  it('counts down in minutes and seconds, rounding up', () => {
    expect(formatCountdown(60_000)).toBe('1:00');
    expect(formatCountdown(59_001)).toBe('1:00');
    expect(formatCountdown(59_000)).toBe('0:59');
    expect(formatCountdown(4_200)).toBe('0:05');
    expect(formatCountdown(0)).toBe('0:00');
    expect(formatCountdown(-10)).toBe('0:00');
  });

  it('says durations in words', () => {
    expect(formatIdleDuration(15 * MINUTE)).toBe('15 minutes');
    expect(formatIdleDuration(MINUTE)).toBe('1 minute');
    expect(formatIdleDuration(90_000)).toBe('90 seconds');
  });
});
