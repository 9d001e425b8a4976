/** The app runs under its Content-Security-Policy with nothing refused, on the dev server and on the built page (vite preview). */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { Page } from 'playwright-core';
import { build, preview, type PreviewServer } from 'vite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { contentSecurityPolicy, type CspMode } from '../../src/app/csp.ts';
import { CHECK_MS, startApp, VIEWPORT, waitForFullSolves, type AppSession } from './app-session.ts';

const ROOT = resolve(import.meta.dirname, '../..');

type Window = { cspViolations: string[]; inlineScriptRan?: boolean };

let session: AppSession | undefined;
let built: PreviewServer | undefined;
let outDir = '';

beforeAll(async () => {
  session = await startApp();
  outDir = mkdtempSync(join(tmpdir(), 'portwright-csp-build-'));
  const config = { root: ROOT, configFile: resolve(ROOT, 'vite.config.ts'), logLevel: 'error' as const };
  await build({ ...config, build: { outDir, emptyOutDir: true } });
  built = await preview({ ...config, build: { outDir }, preview: { port: 0, host: '127.0.0.1', strictPort: false, open: false } });
}, CHECK_MS);

afterAll(async () => {
  await built?.close();
  await session?.close();
  if (outDir) rmSync(outDir, { recursive: true, force: true });
});

/** Where each mode is served: the dev server, or the built files under `vite preview`. */
function address(mode: CspMode): string {
  const url = mode === 'dev' ? session?.url : built?.resolvedUrls?.local[0];
  if (!url) throw new Error(`The ${mode} server did not start.`);
  return url;
}

/** Violations the page has reported so far, as "directive blocked-uri". */
function violations(page: Page): Promise<string[]> {
  return page.evaluate(() => (window as unknown as Window).cspViolations);
}

describe.each(['dev', 'built'] as const)('the app served %s', (mode) => {
  it('carries its policy, solves with no console error and no violation, and refuses an inline script', async () => {
    if (!session) throw new Error('The app session did not start.');
    const context = await session.browser.newContext({ viewport: VIEWPORT });
    try {
      // Listen before the page's own scripts run, so a violation during start-up is caught too.
      await context.addInitScript(() => {
        const w = window as unknown as Window;
        w.cspViolations = [];
        document.addEventListener('securitypolicyviolation', (e) => w.cspViolations.push(`${e.effectiveDirective} ${e.blockedURI}`));
      });
      const page = await context.newPage();
      const problems: string[] = [];
      const keep = (where: string) => (msg: { type(): string; text(): string }) => {
        if (msg.type() === 'error' || msg.type() === 'warning') problems.push(`${where} ${msg.type()}: ${msg.text()}`);
      };
      page.on('console', keep('page'));
      page.on('worker', (worker) => worker.on('console', keep('worker')));
      page.on('pageerror', (err) => problems.push(`pageerror: ${err.message}`));

      const response = await page.goto(address(mode));
      const policy = contentSecurityPolicy(mode);
      expect(response?.headers()['content-security-policy']).toBe(policy);
      expect(response?.headers()['cross-origin-embedder-policy']).toBe('require-corp');
      const meta = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
      expect(meta).toBe(policy);

      await waitForFullSolves(page, 1);
      expect(await page.evaluate(() => crossOriginIsolated)).toBe(true);
      expect(problems).toEqual([]);
      expect(await violations(page)).toEqual([]);

      // The policy is on: an inline script added to the page never runs, and both policies (the header's and the
      // meta tag's, each enforced on its own) report refusing it.
      const ran = await page.evaluate(() => {
        const script = document.createElement('script');
        script.textContent = '(window).inlineScriptRan = true;';
        document.head.append(script);
        return (window as unknown as Window).inlineScriptRan === true;
      });
      expect(ran).toBe(false);
      await page.waitForFunction(() => (window as unknown as Window).cspViolations.length >= 2);
      expect(await violations(page)).toEqual(['script-src-elem inline', 'script-src-elem inline']);
    } finally {
      await context.close();
    }
  }, CHECK_MS);
});
