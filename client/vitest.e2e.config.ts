import { defineConfig } from 'vitest/config';

// Browser tests: playwright-core drives Debian's chromium against the built app, which
// `npm run test:browser` builds first. Each file starts its own server on a fresh database, so
// files stand alone in any order; they run one at a time to stay within a two-core machine.
export default defineConfig({
  test: {
    include: ['e2e/**/*.e2e.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
    // A page that redirects or refetches on a loaded two-core machine can take seconds, not one.
    expect: { poll: { timeout: 10_000, interval: 50 } },
  },
});
