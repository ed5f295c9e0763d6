import { describe, expect, it } from 'vitest';
import { DEFAULT_IDLE_SIGN_OUT_MINUTES, IDLE_SIGN_OUT_MINUTES, parseIdleMinutes } from './env';

describe('VITE_IDLE_SIGN_OUT_MINUTES', () => {
  it('defaults to 15 minutes', () => {
    expect(DEFAULT_IDLE_SIGN_OUT_MINUTES).toBe(15);
    expect(parseIdleMinutes(undefined)).toBe(15);
    expect(parseIdleMinutes('')).toBe(15);
    expect(IDLE_SIGN_OUT_MINUTES).toBeGreaterThanOrEqual(1);
  });

  it('takes a number of minutes of at least 1', () => {
    expect(parseIdleMinutes('5')).toBe(5);
    expect(parseIdleMinutes(' 30 ')).toBe(30);
    expect(parseIdleMinutes('2.5')).toBe(2.5);
    expect(parseIdleMinutes('1')).toBe(1);
  });

  it('falls back to the default for anything else, never switching sign-out off', () => {
    expect(parseIdleMinutes('0')).toBe(15);
    expect(parseIdleMinutes('0.5')).toBe(15);
    expect(parseIdleMinutes('-5')).toBe(15);
    expect(parseIdleMinutes('ten')).toBe(15);
    expect(parseIdleMinutes('10m')).toBe(15);
  });
});
