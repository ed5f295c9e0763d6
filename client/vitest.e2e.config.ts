import { defineConfig } from 'vitest/config';

// Browser tests: playwright-core drives Debian's chromium against the built app. Files run one at
// a time (each starts its own server) to stay within a two-core machine.
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
