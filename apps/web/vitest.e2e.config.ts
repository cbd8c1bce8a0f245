import { defineConfig } from 'vitest/config';

// Browser tests: the built api (serving the built web app) and Debian's chromium, one file at a time.
export default defineConfig({
  test: {
    include: ['e2e/**/*.e2e.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 180_000,
    hookTimeout: 120_000,
  },
});
