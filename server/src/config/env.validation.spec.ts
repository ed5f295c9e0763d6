import { describe, expect, it } from 'vitest';
import { DEMO_JWT_SECRET, validateEnv } from './env.validation.js';

describe('validateEnv', () => {
  it('fills the documented defaults', () => {
    const env = validateEnv({});
    expect(env.PORT).toBe(3000);
    expect(env.DATABASE_PATH).toBe('server/data/lockstep.sqlite');
    expect(env.JWT_SECRET).toBe(DEMO_JWT_SECRET);
    expect(env.DEMO).toBe(true);
  });

  it('lists every bad setting in one readable error', () => {
    expect(() => validateEnv({ PORT: 'eighty', DEMO: 'maybe' })).toThrow(/PORT[\s\S]*DEMO/);
  });

  it('refuses the demo secret in production', () => {
    expect(() => validateEnv({ NODE_ENV: 'production' })).toThrow(/JWT_SECRET: the demo secret/);
    expect(validateEnv({ NODE_ENV: 'production', JWT_SECRET: 'a-real-secret-of-some-length' }).NODE_ENV).toBe(
      'production',
    );
  });

  it('reads DEMO=false', () => {
    expect(validateEnv({ DEMO: 'false' }).DEMO).toBe(false);
  });
});
