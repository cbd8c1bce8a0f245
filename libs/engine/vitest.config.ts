import { defineConfig } from 'vitest/config';

export default defineConfig({
  // Pure functions without global state: sharing the module cache across spec files saves
  // re-importing mathjs and zod for every file.
  // Property tests run thousands of cases; on a loaded 2-core CI machine they need more than the 5 s default.
  test: { include: ['src/**/*.spec.ts'], environment: 'node', isolate: false, pool: 'threads', testTimeout: 60_000 },
});
