import { defineConfig } from 'vitest/config';

export default defineConfig({
  // Editor specs build real Tiptap editors in jsdom; a loaded 2-core CI machine needs more than 5 s.
  test: { include: ['src/**/*.spec.ts'], environment: 'node', testTimeout: 30_000 },
});
