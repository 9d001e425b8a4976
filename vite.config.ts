import { defineConfig } from 'vitest/config';

/** Cross-origin isolation lets the app share a cancel flag with its workers (SharedArrayBuffer). */
const isolation = {
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Embedder-Policy': 'require-corp',
};

export default defineConfig({
  worker: { format: 'es' },
  // One offline page: three.js is most of the bundle, and splitting it would not load faster from disk.
  build: { chunkSizeWarningLimit: 1200 },
  server: { headers: isolation },
  preview: { headers: isolation },
  test: {
    include: ['test/**/*.test.ts'],
    setupFiles: ['test/setup-fast-check.ts'],
    // The bin tests run the compiled command (dist-cli/); it is rebuilt here, once, if a source changed.
    globalSetup: ['test/global-setup.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
