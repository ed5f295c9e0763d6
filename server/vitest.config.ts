import { defineConfig } from 'vitest/config';

// Tests read the shared package's TypeScript source through its "@lockstep/source" export
// condition, so no build of shared is needed before running them.
export default defineConfig({
  ssr: { resolve: { conditions: ['@lockstep/source'] } },
  resolve: { conditions: ['@lockstep/source'] },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['src/**/*.spec.ts'] },
      },
      {
        extends: true,
        test: {
          name: 'api',
          include: ['test/**/*.e2e-spec.ts'],
          setupFiles: ['test/support/setup-env.ts'],
          // Each file boots its own app on its own temporary SQLite file.
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          // Kills and restarts the built server (server/dist): run by `npm run test:crash` at the
          // root, which builds first.
          name: 'crash',
          include: ['test/**/*.crash-spec.ts'],
          testTimeout: 240_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
