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
    expect(validateEnv({ NODE_ENV: 'production', JWT_SECRET: 'a-real-secret-of-some-length' }).NODE_ENV).toBe('production');
  });

  it('fills the sign-in limits, body limit, proxy and log defaults', () => {
    const env = validateEnv({});
    expect(env.JWT_EXPIRES_IN_SECONDS).toBe(8 * 3600);
    expect(env.SIGN_IN_MAX_FAILURES_PER_USERNAME).toBe(5);
    expect(env.SIGN_IN_MAX_FAILURES_PER_ADDRESS).toBe(50);
    expect(env.SIGN_IN_LOCKOUT_MINUTES).toBe(15);
    expect(env.PASSWORD_REQUESTS_PER_MINUTE).toBe(300);
    expect(env.JSON_BODY_LIMIT_KB).toBe(100);
    expect(env.TRUST_PROXY).toBe(false);
    expect(env.LOG_FORMAT).toBe('json');
  });

  it('reads the sign-in limits and refuses nonsense', () => {
    const env = validateEnv({ SIGN_IN_MAX_FAILURES_PER_USERNAME: '3', SIGN_IN_LOCKOUT_MINUTES: '30', PASSWORD_REQUESTS_PER_MINUTE: '20' });
    expect([env.SIGN_IN_MAX_FAILURES_PER_USERNAME, env.SIGN_IN_LOCKOUT_MINUTES, env.PASSWORD_REQUESTS_PER_MINUTE]).toEqual([3, 30, 20]);
    expect(() => validateEnv({ SIGN_IN_MAX_FAILURES_PER_USERNAME: '0' })).toThrow(/SIGN_IN_MAX_FAILURES_PER_USERNAME: must be at least 1/);
    expect(() => validateEnv({ SIGN_IN_LOCKOUT_MINUTES: '2.5' })).toThrow(/SIGN_IN_LOCKOUT_MINUTES: must be a whole number of minutes/);
    expect(() => validateEnv({ JSON_BODY_LIMIT_KB: 'lots' })).toThrow(/JSON_BODY_LIMIT_KB: must be a number of kilobytes/);
  });

  it('reads TRUST_PROXY as off, a hop count or a list of proxies, never as trust-everyone', () => {
    expect(validateEnv({ TRUST_PROXY: 'false' }).TRUST_PROXY).toBe(false);
    expect(validateEnv({ TRUST_PROXY: '1' }).TRUST_PROXY).toBe(1);
    expect(validateEnv({ TRUST_PROXY: 'loopback, 10.0.0.0/8' }).TRUST_PROXY).toBe('loopback, 10.0.0.0/8');
    expect(() => validateEnv({ TRUST_PROXY: 'true' })).toThrow(/TRUST_PROXY: name the proxy/);
    expect(() => validateEnv({ TRUST_PROXY: 'proxy; rm -rf' })).toThrow(/TRUST_PROXY/);
  });

  it('reads LOG_FORMAT', () => {
    expect(validateEnv({ LOG_FORMAT: 'text' }).LOG_FORMAT).toBe('text');
    expect(() => validateEnv({ LOG_FORMAT: 'xml' })).toThrow(/LOG_FORMAT: must be json or text/);
  });

  it('reads DEMO=false', () => {
    expect(validateEnv({ DEMO: 'false' }).DEMO).toBe(false);
  });
});
