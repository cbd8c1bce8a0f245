import { defineConfig } from 'vitest/config';

// The server is bundled by Vite (SSR build) so workspace libraries, which ship TypeScript
// sources, are compiled in; node_modules stay external. Vitest uses the same transform,
// which reads experimentalDecorators/emitDecoratorMetadata from tsconfig.json.
export default defineConfig({
  build: {
    ssr: true,
    target: 'node20',
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    rollupOptions: {
      input: {
        main: 'src/main.ts',
        // Beside main.js so the evaluation pool finds it (see modules/methods/evaluation-pool.ts).
        'evaluation.worker': 'src/modules/methods/evaluation.worker.ts',
      },
      output: { entryFileNames: '[name].js', format: 'es' },
    },
  },
  ssr: { noExternal: [/^@limitbook\//] },
  test: {
    include: ['src/**/*.spec.ts'],
    globalSetup: ['src/testing/global-setup.ts'],
    environment: 'node',
    hookTimeout: 60_000,
    testTimeout: 30_000,
    pool: 'forks',
    maxWorkers: 2,
  },
});
