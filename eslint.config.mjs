import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

// One lint for the three packages. Layout is Prettier's job (npm run format), so no style rules here.

const FEATURES = readdirSync(new URL('./client/src/features', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

const featureMessage =
  'A client feature does not import another feature: move what both need up to api/, components/, lib/, hooks/ or utils/.';
const sharedLayerMessage = 'Shared client code (api, components, lib, hooks, utils, config) does not import a feature or the app.';

/** bulletproof-react's rule: features stay apart, and the shared layers never reach into them. */
const importBoundaries = [
  ...FEATURES.map((feature) => ({
    files: [`client/src/features/${feature}/**/*.{ts,tsx}`],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['@/features/*', `!@/features/${feature}`], message: featureMessage },
            { group: ['@/app/*'], message: 'A feature does not import the app: the app imports features.' },
            { regex: '^(\\.\\./){2,}(?!\\.)', message: `${featureMessage} Import shared code through '@/…'.` },
          ],
        },
      ],
    },
  })),
  {
    files: ['client/src/{api,components,lib,hooks,utils,config,testing}/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': ['error', { patterns: [{ group: ['@/features/*', '@/app/*'], message: sharedLayerMessage }] }] },
  },
];

export default tseslint.config(
  { ignores: ['**/node_modules/', '**/dist/', 'server/dist-bench/', 'coverage/', 'client/e2e/artifacts/', 'server/data/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
    },
  },
  {
    // Page scripts run in the browser (page.evaluate in the benchmark and browser tests).
    files: ['client/bench/**', 'client/e2e/**'],
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
  },
  {
    files: ['client/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  ...importBoundaries,
);
