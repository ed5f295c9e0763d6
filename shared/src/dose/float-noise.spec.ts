import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundTo, withoutFloatNoise } from './float-noise.js';

// IEEE 754 binary64 arithmetic (definition): these are the textbook noisy results.
describe('withoutFloatNoise', () => {
  it('removes binary rounding noise', () => {
    expect(withoutFloatNoise(0.1 + 0.2)).toBe(0.3);
    expect(withoutFloatNoise(0.3 / 0.1)).toBe(3);
    expect(withoutFloatNoise(0.2 * 6)).toBe(1.2);
  });
  it('keeps real precision and non-finite values', () => {
    expect(withoutFloatNoise(0.0125)).toBe(0.0125);
    expect(withoutFloatNoise(123456.789)).toBe(123456.789);
    expect(withoutFloatNoise(Infinity)).toBe(Infinity);
    expect(withoutFloatNoise(Number.NaN)).toBeNaN();
    expect(Object.is(withoutFloatNoise(-0), 0)).toBe(true);
  });
  it('gives whole numbers the same answer by its short path as by the string round trip', () => {
    const slow = (value: number) => Number(value.toPrecision(12)) + 0;
    fc.assert(
      fc.property(fc.integer({ min: -999_999_999_999, max: 999_999_999_999 }), (value) => Object.is(withoutFloatNoise(value), slow(value))),
    );
    expect(withoutFloatNoise(1e13 + 1)).toBe(1e13); // beyond 12 digits the rounding still applies
  });
});

describe('roundTo', () => {
  it('rounds to the given decimals without float noise', () => {
    expect(roundTo(1.2345, 3)).toBe(1.235); // 1.2345 is stored as 1.23449999…; noise removal first
    expect(roundTo(0.1 + 0.2, 3)).toBe(0.3);
    expect(roundTo(-2.0005, 3)).toBe(-2.001);
    expect(Object.is(roundTo(-0.0001, 3), 0)).toBe(true);
  });
});
