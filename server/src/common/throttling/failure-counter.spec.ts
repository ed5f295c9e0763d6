import { describe, expect, it } from 'vitest';
import { FailureCounter } from './failure-counter.js';
import { carriesPassword } from './password-rate.guard.js';

const MINUTE = 60_000;

describe('FailureCounter', () => {
  it('lets a key try until it reaches the limit, then until the oldest failure is a window old', () => {
    const counter = new FailureCounter(3, 15 * MINUTE);
    counter.add('kai', 0);
    counter.add('kai', 1 * MINUTE);
    expect(counter.retryAfterMs('kai', 2 * MINUTE)).toBe(0);
    counter.add('kai', 2 * MINUTE);
    expect(counter.retryAfterMs('kai', 2 * MINUTE)).toBe(13 * MINUTE);
    expect(counter.retryAfterMs('kai', 15 * MINUTE)).toBe(0);
    expect(counter.retryAfterMs('rosa', 2 * MINUTE)).toBe(0);
  });

  it('takes back one failure, clears a key, and lists only locked keys', () => {
    const counter = new FailureCounter(2, 15 * MINUTE);
    counter.add('a', 0);
    counter.add('a', 10);
    counter.add('b', 10);
    expect(counter.locked(20)).toEqual([{ key: 'a', failures: 2, retryAfterMs: 15 * MINUTE - 20 }]);
    counter.remove('a', 10);
    expect(counter.retryAfterMs('a', 20)).toBe(0);
    expect(counter.clear('b')).toBe(true);
    expect(counter.clear('b')).toBe(false);
  });

  it('forgets failures older than the window', () => {
    const counter = new FailureCounter(2, MINUTE);
    counter.add('a', 0);
    counter.add('a', 1);
    counter.sweep(2 * MINUTE);
    expect(counter.locked(2 * MINUTE)).toEqual([]);
    expect(counter.add('a', 2 * MINUTE)).toBe(1);
  });
});

describe('carriesPassword', () => {
  it.each([
    [{ username: 'kai.mendes', password: 'x' }, true],
    [{ signature: { password: 'x' } }, true],
    [{ witness: { username: 'rosa.adeyemi', password: 'x' }, reason: 'r' }, true],
    [{ reason: 'no password here', settings: { demandDose: 1 } }, false],
    [null, false],
    ['password', false],
  ])('%j → %s', (body, expected) => {
    expect(carriesPassword(body)).toBe(expected);
  });
});
