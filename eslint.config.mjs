// Lint with Next.js's own rules (React, hooks, accessibility basics, Core Web Vitals) and its TypeScript set.
import { defineConfig, globalIgnores } from 'eslint/config';
import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  globalIgnores(['.next/**', 'node_modules/**', 'data/**', 'lib/db/generated/**', 'next-env.d.ts', 'test-results/**']),
  {
    // Tests are not React: their `use…` helpers set up a database or a browser, not hooks.
    files: ['tests/**/*.ts'],
    rules: { 'react-hooks/rules-of-hooks': 'off' },
  },
  {
    rules: {
      // Photos are served from the database behind a session check by our own route; next/image's optimiser
      // would fetch them without the session. Plain <img> with width/height is right here.
      '@next/next/no-img-element': 'off',
      // Unused names are mistakes, except a deliberate `_` prefix.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_' }],
    },
  },
]);
