/** Browser-check plumbing for the view: a Vite dev server on a free port and headless chromium (test/chromium.ts) via playwright-core. */

import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { createServer, type ViteDevServer } from 'vite';

import { chromiumPath } from '../chromium.ts';
import { CHROMIUM_ARGS } from './app-session.ts';

export { CHROMIUM_ARGS };

export interface BrowserSession {
  readonly server: ViteDevServer;
  readonly browser: Browser;
  readonly baseUrl: string;
  close(): Promise<void>;
}

export async function startSession(): Promise<BrowserSession> {
  const root = resolve(import.meta.dirname, '../..');
  const server = await createServer({
    root,
    configFile: false,
    logLevel: 'error',
    // Own cache so parallel helpers' dev servers do not share pre-bundled deps.
    cacheDir: mkdtempSync(join(tmpdir(), 'portwright-view-vite-')),
    server: { port: 0, host: '127.0.0.1', strictPort: false, hmr: false },
    optimizeDeps: { entries: ['test/e2e/harness/view-harness.html'] },
  });
  await server.listen();
  const address = server.httpServer?.address();
  if (!address || typeof address === 'string') throw new Error('Vite dev server has no port');
  const browser = await chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS });
  return {
    server,
    browser,
    baseUrl: `http://127.0.0.1:${address.port}`,
    async close() {
      await browser.close();
      await server.close();
    },
  };
}

/** Console errors, warnings and uncaught exceptions of a page, collected as they happen. */
export function collectProblems(page: Page): string[] {
  const problems: string[] = [];
  page.on('console', (msg) => {
    if (msg.type() === 'error' || msg.type() === 'warning') problems.push(`${msg.type()}: ${msg.text()}`);
  });
  page.on('pageerror', (err) => problems.push(`pageerror: ${err.message}`));
  return problems;
}
