import { describe, expect, it } from 'vitest';
import { storedDate } from './stored-date.js';

describe('storedDate', () => {
  it('reads the UTC text TypeORM stores on SQLite', () => {
    expect(storedDate('2026-01-02 03:04:05.678').toISOString()).toBe('2026-01-02T03:04:05.678Z');
    expect(storedDate('2026-01-02 03:04:05').toISOString()).toBe('2026-01-02T03:04:05.000Z');
  });

  it('keeps an explicit zone and passes a Date through', () => {
    expect(storedDate('2026-01-02T03:04:05+02:00').toISOString()).toBe('2026-01-02T01:04:05.000Z');
    expect(storedDate('2026-01-02T03:04:05Z').toISOString()).toBe('2026-01-02T03:04:05.000Z');
    const date = new Date('2026-01-02T03:04:05Z');
    expect(storedDate(date)).toBe(date);
  });
});
