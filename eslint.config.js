import js from '@eslint/js';
import globals from 'globals';
import reactHooks from 'eslint-plugin-react-hooks';
import tseslint from 'typescript-eslint';

// Module boundaries: contracts depend on zod only, the engine on contracts and mathjs only,
// and neither imports a framework. Web features stay independent; routes combine them.
const frameworkImports = ['@nestjs/*', 'react', 'react-dom', 'react-router-dom', '@mantine/*', '@tiptap/*', 'drizzle-orm', 'drizzle-orm/*', '@electric-sql/*', 'node:*'];

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '**/*.config.ts', '**/*.config.js'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false }],
      'no-console': 'off',
    },
  },
  {
    files: ['libs/contracts/src/**/*.ts'],
    ignores: ['libs/contracts/src/**/*.spec.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ regex: '^(?!zod$|\\.{1,2}/)', message: 'libs/contracts depends on zod only.' }] }],
    },
  },
  {
    files: ['libs/engine/src/**/*.ts'],
    ignores: ['libs/engine/src/**/*.spec.ts', 'libs/engine/src/**/*.bench.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: frameworkImports, message: 'libs/engine is pure: no framework, database or Node I/O imports.' }] }],
    },
  },
  {
    files: ['libs/editor-schema/src/**/*.ts'],
    ignores: ['libs/editor-schema/src/**/*.spec.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['@nestjs/*', 'react', 'react-dom', '@tiptap/react', 'drizzle-orm', 'drizzle-orm/*', 'node:*'], message: 'libs/editor-schema is view-less and server-safe: no React, NestJS, database or Node I/O imports.' }] }],
    },
  },
  {
    // The api uses NestJS decorators with parameter injection; type-only imports would erase the DI tokens.
    files: ['apps/api/src/**/*.ts'],
    rules: { '@typescript-eslint/consistent-type-imports': 'off' },
  },
  {
    files: ['apps/web/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': ['error', { patterns: [{ group: ['@nestjs/*', 'drizzle-orm', '@limitbook/engine'], message: 'The web app talks to the server through the API client, never to server code.' }] }],
    },
  },
  {
    files: ['apps/web/src/features/*/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['@/features/*', '../../*/**'], message: 'Features do not import each other; compose them in app/routes.' }] }],
    },
  },
);
