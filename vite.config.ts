import { defineConfig, type Plugin } from 'vitest/config';
import { contentSecurityPolicy, type CspMode } from './src/app/csp.ts';

/** Cross-origin isolation lets the app share a cancel flag with its workers (SharedArrayBuffer). */
const isolation = {
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Embedder-Policy': 'require-corp',
};

/** Headers of every response: the isolation above and the app's Content-Security-Policy (src/app/csp.ts). */
function headers(mode: CspMode): Record<string, string> {
  return { ...isolation, 'Content-Security-Policy': contentSecurityPolicy(mode) };
}

/** Writes the policy into index.html as a meta tag (first in <head>), so the built page carries it on any server. */
function cspMeta(): Plugin {
  let mode: CspMode = 'built';
  return {
    name: 'portwright-csp-meta',
    configResolved(config) {
      mode = config.command === 'serve' ? 'dev' : 'built';
    },
    transformIndexHtml: () => [
      { tag: 'meta', attrs: { 'http-equiv': 'Content-Security-Policy', content: contentSecurityPolicy(mode) }, injectTo: 'head-prepend' },
    ],
  };
}

export default defineConfig({
  plugins: [cspMeta()],
  worker: { format: 'es' },
  // One offline page: three.js is most of the bundle, and splitting it would not load faster from disk.
  build: { chunkSizeWarningLimit: 1200 },
  server: { headers: headers('dev') },
  preview: { headers: headers('built') },
  test: {
    include: ['test/**/*.test.ts'],
    setupFiles: ['test/setup-fast-check.ts'],
    // The bin tests run the compiled command (dist-cli/); it is rebuilt here, once, if a source changed. The browser
    // tests' chromium is found (or installed) here too, so a missing browser stops the run before any test starts.
    globalSetup: ['test/global-setup.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
