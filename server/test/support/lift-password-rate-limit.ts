import { afterAll } from 'vitest';

// Imported first (before the app) by the bad-input files: every bad body that carries a password
// counts against the per-address limit of password-bearing requests, and those files send
// thousands on purpose. They are about validation, so the limit is lifted for them alone.
const previousLimit = process.env.PASSWORD_REQUESTS_PER_MINUTE;
process.env.PASSWORD_REQUESTS_PER_MINUTE = '100000';

afterAll(() => {
  if (previousLimit === undefined) delete process.env.PASSWORD_REQUESTS_PER_MINUTE;
  else process.env.PASSWORD_REQUESTS_PER_MINUTE = previousLimit;
});
