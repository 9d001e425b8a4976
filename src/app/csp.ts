/** The app's Content-Security-Policy: one source for the dev server, the preview, the built page's meta tag and the tests. */

/** Where the page is served from: Vite's dev server (hot reload over a WebSocket) or the built files. */
export type CspMode = 'dev' | 'built';

/** Directive name -> allowed sources, in the order they are written out. */
export type CspDirectives = Readonly<Record<string, readonly string[]>>;

/**
 * The policy's directives. Nothing from another origin, no eval and no inline script anywhere (zod's compiled
 * parsers, which need eval, are switched off in src/app/zod-jitless.ts).
 */
export function cspDirectives(mode: CspMode): CspDirectives {
  return {
    'default-src': ["'self'"],
    'script-src': ["'self'"],
    'worker-src': ["'self'"],
    // lil-gui (the settings panel) and the bench panel add their stylesheets as <style> elements, and in dev Vite
    // adds any CSS a module imports the same way; all are refused without 'unsafe-inline'. Styles cannot run code.
    'style-src': ["'self'", "'unsafe-inline'"],
    // lil-gui's stylesheet carries its icon font (the folder arrows) as a data: URI.
    'font-src': ["'self'", 'data:'],
    // The favicon is a data: URI; a traced photo shown under the drawing will be a blob: URL.
    'img-src': ["'self'", 'data:', 'blob:'],
    // In dev, Vite's hot reload talks over a WebSocket; the built page needs none.
    'connect-src': mode === 'dev' ? ["'self'", 'ws:'] : ["'self'"],
    'object-src': ["'none'"],
    'base-uri': ["'none'"],
    'form-action': ["'none'"],
  };
}

/** The policy as one header or meta value, e.g. "default-src 'self'; script-src 'self'; ...". */
export function contentSecurityPolicy(mode: CspMode): string {
  return Object.entries(cspDirectives(mode))
    .map(([name, sources]) => `${name} ${sources.join(' ')}`)
    .join('; ');
}
