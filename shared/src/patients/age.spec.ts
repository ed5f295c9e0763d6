import { describe, expect, it } from 'vitest';
import { ageInMonths, ageInYears } from './age.js';

// Age in completed years is the ordinary calendar definition (common practice, no single source).
describe('ageInYears', () => {
  it('counts completed years only', () => {
    expect(ageInYears('1950-06-15', new Date('2026-06-14T12:00:00Z'))).toBe(75);
    expect(ageInYears('1950-06-15', new Date('2026-06-15T12:00:00Z'))).toBe(76);
  });
  it('handles a 29 February birthday in a common year', () => {
    expect(ageInYears('2016-02-29', new Date('2026-02-28T12:00:00Z'))).toBe(9);
    expect(ageInYears('2016-02-29', new Date('2026-03-01T12:00:00Z'))).toBe(10);
  });
});

// Completed months, the way growth charts count age (WHO Child Growth Standards tabulate by completed month).
describe('ageInMonths', () => {
  it('counts completed months only', () => {
    expect(ageInMonths('2024-01-15', new Date('2026-01-14T12:00:00Z'))).toBe(23);
    expect(ageInMonths('2024-01-15', new Date('2026-01-15T12:00:00Z'))).toBe(24);
    expect(ageInMonths('2020-06-30', new Date('2026-12-03T12:00:00Z'))).toBe(77);
  });
});
