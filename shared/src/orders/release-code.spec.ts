import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { normaliseReleaseCode, RELEASE_CODE_ALPHABET, releaseCode } from './release-code.js';

describe('release codes', () => {
  it('never uses characters that are read two ways ([practice]: 0/O, 1/I/L, 5/S, 8/B)', () => {
    for (const ambiguous of '0O1IL5S8B') expect(RELEASE_CODE_ALPHABET).not.toContain(ambiguous);
    fc.assert(
      fc.property(fc.array(fc.nat(), { minLength: 6, maxLength: 6 }), (draws) => {
        let i = 0;
        const code = releaseCode((n) => draws[i++] % n);
        expect(code).toMatch(/^[234679ACDEFGHJKMNPQRTUVWXYZ]{3}-[234679ACDEFGHJKMNPQRTUVWXYZ]{3}$/);
      }),
    );
  });

  it('reads what a person types back to the printed form', () => {
    expect(normaliseReleaseCode('k7m 4qx')).toBe('K7M-4QX');
    expect(normaliseReleaseCode('K7M-4QX')).toBe('K7M-4QX');
  });
});
