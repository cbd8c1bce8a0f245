import { defineConfig } from 'vitest/config';

export default defineConfig({
  // Pure functions without global state: sharing the module cache across spec files saves
  // re-importing mathjs and zod for every file.
  test: { include: ['src/**/*.spec.ts'], environment: 'node', isolate: false, pool: 'threads' },
});
