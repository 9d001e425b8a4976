/** The app's Content-Security-Policy says what the issue asks: no eval, no inline script, nothing from elsewhere. */
import { describe, expect, it } from 'vitest';
import { contentSecurityPolicy, cspDirectives } from '../../src/app/csp.ts';

describe('contentSecurityPolicy', () => {
  it('is the built page\'s policy, written out in full', () => {
    expect(contentSecurityPolicy('built')).toBe(
      "default-src 'self'; script-src 'self'; worker-src 'self'; style-src 'self' 'unsafe-inline'; font-src 'self' data:; " +
        "img-src 'self' data: blob:; connect-src 'self'; object-src 'none'; base-uri 'none'; form-action 'none'",
    );
  });

  it('allows a WebSocket (hot reload) in dev only', () => {
    expect(cspDirectives('dev')['connect-src']).toEqual(["'self'", 'ws:']);
    expect(cspDirectives('built')['connect-src']).toEqual(["'self'"]);
  });

  it('never allows eval or inline script, in either mode', () => {
    for (const mode of ['dev', 'built'] as const) {
      const policy = contentSecurityPolicy(mode);
      expect(policy).not.toContain('unsafe-eval');
      expect(cspDirectives(mode)['script-src']).toEqual(["'self'"]);
      expect(cspDirectives(mode)['worker-src']).toEqual(["'self'"]);
    }
  });
});
