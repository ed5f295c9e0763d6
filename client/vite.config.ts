import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defaultClientConditions, defineConfig } from 'vite';

// '@lockstep/source' makes vite read the shared package's TypeScript source, so the client
// never needs a prebuilt copy of `shared` in development or in its own build.
export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
    conditions: ['@lockstep/source', ...defaultClientConditions],
  },
  server: {
    port: 5173,
    proxy: {
      '/api': { target: 'http://localhost:3000', changeOrigin: false },
    },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // dist/.vite/manifest.json: which chunks each entry loads (the bundle-budget test reads it).
    manifest: true,
    rolldownOptions: {
      output: {
        // Name the libraries every screen needs so they cache across releases; everything
        // else (Mantine components, the table library) is split per route automatically.
        codeSplitting: {
          groups: [
            {
              name: 'react',
              test: /node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom|cookie|set-cookie-parser)[\\/]/,
            },
            { name: 'zod', test: /node_modules[\\/]zod[\\/]/ },
            { name: 'query', test: /node_modules[\\/]@tanstack[\\/](query-core|react-query)[\\/]/ },
          ],
        },
      },
    },
  },
});
