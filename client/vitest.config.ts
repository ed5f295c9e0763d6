import { fileURLToPath } from 'node:url';
import { defaultClientConditions, defaultServerConditions } from 'vite';
import { defineConfig } from 'vitest/config';

// Unit tests only: pure TypeScript in the node environment. Browser tests live in e2e/ with
// their own config. '@lockstep/source' reads the shared package's source instead of its build.
export default defineConfig({
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
    conditions: ['@lockstep/source', ...defaultClientConditions],
  },
  ssr: {
    resolve: {
      conditions: ['@lockstep/source', ...defaultServerConditions],
    },
  },
  test: {
    include: ['src/**/*.test.{ts,tsx}'],
    environment: 'node',
  },
});
