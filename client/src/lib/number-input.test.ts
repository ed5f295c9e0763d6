import { describe, expect, it } from 'vitest';
import { readNumber } from './number-input';

describe('readNumber', () => {
  it('reads what a NumberInput holds while typing', () => {
    expect(readNumber('')).toBeNull();
    expect(readNumber('  ')).toBeNull();
    expect(readNumber('0.5')).toBe(0.5);
    expect(readNumber('.5')).toBe(0.5);
    expect(readNumber('5.')).toBe(5);
    expect(readNumber(' 2.5 ')).toBe(2.5);
    expect(readNumber(2)).toBe(2);
    expect(readNumber(4)).toBe(4);
  });

  it('takes plain decimals only; anything else is undefined', () => {
    expect(readNumber('-1')).toBeUndefined();
    expect(readNumber('1e2')).toBeUndefined();
    expect(readNumber('1,5')).toBeUndefined();
    expect(readNumber('1.2.3')).toBeUndefined();
    expect(readNumber('abc')).toBeUndefined();
    expect(readNumber(Number.NaN)).toBeUndefined();
  });
});
