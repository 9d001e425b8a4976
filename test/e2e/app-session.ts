/** The whole app in a browser for checks and the drag benchmark: Vite dev server with the repo's config, headless chromium. */

import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { createServer, type ViteDevServer } from 'vite';
import { chromiumPath } from '../chromium.ts';

const ROOT = resolve(import.meta.dirname, '../..');

/** Chromium (Debian's, or PORTWRIGHT_CHROMIUM; see test/chromium.ts), software WebGL (SwiftShader) so the check runs on machines without a GPU. */
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--use-angle=swiftshader',
  '--enable-unsafe-swiftshader',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

export interface AppSession {
  readonly server: ViteDevServer;
  readonly browser: Browser;
  /** Address of index.html, e.g. "http://127.0.0.1:41234/". */
  readonly url: string;
  close(): Promise<void>;
}

/** Starts the dev server (the repo's vite.config.ts, so the cross-origin isolation headers apply) and the browser,
 * with CHROMIUM_ARGS and any `extraArgs` (e.g. the benchmark's other compositing mode). */
export async function startApp(extraArgs: readonly string[] = []): Promise<AppSession> {
  const server = await createServer({
    root: ROOT,
    configFile: resolve(ROOT, 'vite.config.ts'),
    logLevel: 'error',
    // Own cache: dev servers of other checks running at the same time must not rewrite our pre-bundled deps.
    cacheDir: mkdtempSync(join(tmpdir(), 'portwright-app-vite-')),
    server: { port: 0, host: '127.0.0.1', strictPort: false, hmr: false },
    // Crawl the whole app up front, so no late dependency discovery reloads the page mid-check.
    optimizeDeps: { entries: ['index.html'], include: ['comlink', 'three', 'lil-gui', 'd3-contour', 'zod'] },
  });
  let browser: Browser | undefined;
  try {
    await server.listen();
    const url = server.resolvedUrls?.local[0];
    if (!url) throw new Error('Vite dev server reported no local address');
    browser = await chromium.launch({ executablePath: chromiumPath(), args: [...CHROMIUM_ARGS, ...extraArgs] });
    const opened = browser;
    return {
      server,
      browser: opened,
      url,
      async close() {
        await opened.close();
        await server.close();
      },
    };
  } catch (error) {
    await browser?.close();
    await server.close();
    throw error;
  }
}

export interface AppPage {
  readonly context: BrowserContext;
  readonly page: Page;
  /** Console errors and warnings, uncaught exceptions, failed requests and HTTP errors, as they happen. */
  readonly problems: string[];
}

/** Solves on the standard grid take seconds, longer when the machine is shared: each app check gets minutes. */
export const CHECK_MS = 180_000;

/** Viewport of every check: a laptop screen. */
export const VIEWPORT = { width: 1280, height: 800 } as const;

/**
 * Opens the app in a fresh browser context (empty local storage, so no autosave from an earlier check) and waits
 * until the sample has been solved on the full grid and drawn.
 */
export async function openApp(session: AppSession): Promise<AppPage> {
  const context = await session.browser.newContext({ viewport: VIEWPORT, acceptDownloads: true });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('console', (msg) => {
    if (msg.type() === 'error' || msg.type() === 'warning') problems.push(`${msg.type()}: ${msg.text()}`);
  });
  page.on('pageerror', (err) => problems.push(`pageerror: ${err.message}`));
  page.on('requestfailed', (req) => problems.push(`request failed: ${req.url()} (${req.failure()?.errorText})`));
  page.on('response', (res) => {
    if (res.status() >= 400) problems.push(`HTTP ${res.status()}: ${res.url()}`);
  });
  await page.goto(session.url);
  try {
    await waitForFullSolves(page, 1);
  } catch (error) {
    // Say what the page showed, not only that it timed out.
    const shown = await page.evaluate(() => ({
      status: document.getElementById('status')?.textContent,
      indicator: document.getElementById('solve-indicator')?.textContent,
    })).catch(() => null);
    await context.close();
    throw new Error(`The app did not finish its first solve: ${JSON.stringify({ shown, problems })}`, { cause: error });
  }
  return { context, page, problems };
}

/** Waits until at least `count` full-grid solves have been drawn and nothing is in flight. */
export async function waitForFullSolves(page: Page, count: number, timeoutMs = 90_000): Promise<void> {
  await page.waitForFunction(
    (n) => {
      const app = (window as unknown as { portwright?: { timings: Array<{ kind: string }> } }).portwright;
      const full = app?.timings.filter((t) => t.kind === 'full').length ?? 0;
      return full >= n && document.getElementById('solve-indicator')?.dataset.state === 'idle';
    },
    count,
    { timeout: timeoutMs, polling: 50 },
  );
}

/** Number of solves of a kind drawn so far. */
export function solveCount(page: Page, kind: 'drag' | 'full'): Promise<number> {
  return page.evaluate(
    (k) => (window as unknown as { portwright: { timings: Array<{ kind: string }> } }).portwright.timings.filter((t) => t.kind === k).length,
    kind,
  );
}

/** Runs `check` on the app opened in a fresh context (no autosave or selection left over from another check), and
 * closes that context whatever happens. */
export async function withApp(session: AppSession, check: (app: AppPage) => Promise<void>): Promise<void> {
  const app = await openApp(session);
  try {
    await check(app);
  } finally {
    await app.context.close();
  }
}
