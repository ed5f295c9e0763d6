import { BadRequestException } from '@nestjs/common';
import { describe, expect, it } from 'vitest';
import { bodyHash, parseIdempotencyKey } from './idempotency.service.js';

describe('parseIdempotencyKey', () => {
  it('takes 1 to 200 printable characters, and nothing when the header is absent', () => {
    expect(parseIdempotencyKey(undefined)).toBeUndefined();
    expect(parseIdempotencyKey('b7c1a0e2-5f4d-4c3b-9a8e-7d6c5b4a3f21')).toBe('b7c1a0e2-5f4d-4c3b-9a8e-7d6c5b4a3f21');
    expect(parseIdempotencyKey('k'.repeat(200))).toHaveLength(200);
  });

  it.each([[''], ['k'.repeat(201)], ['tab\there'], ['line\nbreak'], ['é'], [['a', 'b']]])(
    'refuses %j with a 400 naming the header',
    (key) => {
      const refuse = () => parseIdempotencyKey(key);
      expect(refuse).toThrow(BadRequestException);
      try {
        refuse();
      } catch (error) {
        expect((error as BadRequestException).getResponse()).toMatchObject({ errors: [{ field: 'Idempotency-Key' }] });
      }
    },
  );
});

describe('bodyHash', () => {
  it('is the same for the same body in any key order, and differs when a value differs', () => {
    expect(bodyHash({ a: 1, b: { c: [1, 2] } })).toBe(bodyHash({ b: { c: [1, 2] }, a: 1 }));
    expect(bodyHash({ a: 1 })).not.toBe(bodyHash({ a: 2 }));
    expect(bodyHash(undefined)).toBe(bodyHash(null));
    expect(bodyHash({ a: 1 })).toMatch(/^[0-9a-f]{64}$/);
  });

  it('leaves out every password field, so no password is hashed into the store', () => {
    const signed = (password: string) => ({ amount: 1, witness: { username: 'rosa', password }, signature: { password } });
    expect(bodyHash(signed('one'))).toBe(bodyHash(signed('two')));
    expect(bodyHash(signed('one'))).toBe(bodyHash({ amount: 1, witness: { username: 'rosa' }, signature: {} }));
    expect(bodyHash({ newPassword: 'x', currentPassword: 'y' })).toBe(bodyHash({}));
  });
});
