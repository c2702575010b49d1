import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', 'test-results/**', 'playwright-report/**', '**/test-results/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': 'error',
      'no-console': 'off',
    },
  },
  {
    files: ['apps/admin/src/**/*.{ts,tsx}', 'apps/kiosk/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: reactHooks.configs.recommended.rules,
  },
  {
    // Playwright fixtures that use no other fixture still destructure an empty first argument.
    files: ['tests/**/*.ts'],
    rules: { 'no-empty-pattern': 'off' },
  },
  {
    // Layering: the pure core knows nothing of React, Express or Knex.
    files: ['packages/core/src/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: ['react', 'react-*', 'express', 'knex', 'pg', '@chuckkey/db', '@chuckkey/server'] }],
    },
  },
  {
    // The front ends never import the server or the database package.
    files: ['apps/admin/src/**', 'apps/kiosk/src/**'],
    rules: {
      'no-restricted-imports': ['error', { patterns: ['@chuckkey/server', '@chuckkey/db', 'express', 'knex', 'pg'] }],
    },
  },
);
