import { describe, expect, it } from 'vitest';
import { latestTodayAnywhere, weightAgeDays, weightDateProblem } from './weight.js';

describe('weightDateProblem', () => {
  it('accepts a day from the date of birth up to today', () => {
    expect(weightDateProblem('2026-12-03', '1960-01-01', '2026-12-03')).toBeNull();
    expect(weightDateProblem('1960-01-01', '1960-01-01', '2026-12-03')).toBeNull();
  });

  it('refuses a day in the future, before birth, or not a yyyy-mm-dd day', () => {
    expect(weightDateProblem('2026-12-04', '1960-01-01', '2026-12-03')).toMatch(/future/);
    expect(weightDateProblem('1959-12-31', '1960-01-01', '2026-12-03')).toMatch(/before the date of birth/);
    expect(weightDateProblem('3/12/2026', '1960-01-01', '2026-12-03')).toMatch(/yyyy-mm-dd/);
  });
});

describe('weightAgeDays', () => {
  it('counts whole days, and is null without a date', () => {
    expect(weightAgeDays('2026-11-26', '2026-12-03')).toBe(7);
    expect(weightAgeDays('2026-12-03', '2026-12-03')).toBe(0);
    expect(weightAgeDays(null, '2026-12-03')).toBeNull();
    expect(weightAgeDays('not a day', '2026-12-03')).toBeNull();
  });
});

describe('latestTodayAnywhere', () => {
  it('is the day at UTC+14, so no ward’s today counts as the future', () => {
    expect(latestTodayAnywhere(new Date('2026-12-03T09:59:00Z'))).toBe('2026-12-03');
    expect(latestTodayAnywhere(new Date('2026-12-03T10:00:00Z'))).toBe('2026-12-04');
  });
});
