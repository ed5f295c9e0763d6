import { describe, expect, it } from 'vitest';
import { maxDemandsInWindow, maxDemandsPerHour } from './max-demands-per-hour.js';

describe('maxDemandsPerHour', () => {
  it('allows 6 demands an hour with a 10-minute lockout', () => {
    // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: lockout 10 minutes.
    expect(maxDemandsPerHour(10)).toBe(6);
  });

  it('covers the lockouts of the typical ranges', () => {
    // Typical ranges, common practice (docs/clinical-sources.md, "Typical ranges"; no single published table): lockout 5–10 min
    // (morphine), 4–10 min (fentanyl). ceil(60 ÷ lockout) is the definition.
    expect(maxDemandsPerHour(5)).toBe(12);
    expect(maxDemandsPerHour(4)).toBe(15);
    expect(maxDemandsPerHour(8)).toBe(8); // 60 ÷ 8 = 7.5: demands at 0, 8, … 56 minutes
    expect(maxDemandsPerHour(7)).toBe(9);
    expect(maxDemandsPerHour(60)).toBe(1);
    expect(maxDemandsPerHour(90)).toBe(1);
  });

  it('is not pushed up a whole demand by float noise', () => {
    expect(maxDemandsPerHour(60 / 7)).toBe(7);
    expect(maxDemandsInWindow(4.8, 240)).toBe(50);
  });

  it('treats a lockout of 0 or less as no limit and NaN as unknown', () => {
    expect(maxDemandsPerHour(0)).toBe(Infinity);
    expect(maxDemandsPerHour(-5)).toBe(Infinity);
    expect(maxDemandsPerHour(Number.NaN)).toBeNaN();
  });
});

describe('maxDemandsInWindow', () => {
  it('counts 24 demands in 4 hours with a 10-minute lockout (definition: ceil(240 ÷ 10))', () => {
    expect(maxDemandsInWindow(10, 240)).toBe(24);
    expect(maxDemandsInWindow(7, 240)).toBe(35);
  });
});
