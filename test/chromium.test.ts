/** The browser tests' preparation decides right: found, install, or one line naming the fix (probes injected, nothing uninstalled). */
import { describe, expect, it } from 'vitest';
import {
  browserNeeded,
  chromiumPath,
  cliFilters,
  DEBIAN_CHROMIUM,
  planBrowser,
  prepareBrowser,
  type MachineProbes,
} from './chromium.ts';

/** A machine with the given programs; by default Debian, not root, nothing installed, PATH /usr/local/bin:/usr/bin. */
function machine(programs: string[], over: Partial<MachineProbes> = {}): MachineProbes {
  const present = new Set(programs);
  return {
    override: undefined,
    searchPath: ['/usr/local/bin', '/usr/bin'],
    isProgram: (path) => present.has(path),
    debian: true,
    root: false,
    ...over,
  };
}

/** A failure message is one line of whole sentences naming a fix. */
function expectOneLineFix(message: string): void {
  expect(message).not.toContain('\n');
  expect(message).toMatch(/\.$/);
  expect(message).toContain('PORTWRIGHT_CHROMIUM');
}

describe('planBrowser', () => {
  it("uses Debian's chromium when it is there", () => {
    expect(planBrowser(machine([DEBIAN_CHROMIUM]))).toEqual({ kind: 'found', path: DEBIAN_CHROMIUM });
  });

  it('finds a chromium elsewhere on PATH', () => {
    expect(planBrowser(machine(['/usr/local/bin/chromium']))).toEqual({ kind: 'found', path: '/usr/local/bin/chromium' });
  });

  it('uses PORTWRIGHT_CHROMIUM ahead of Debian\'s', () => {
    const probes = machine([DEBIAN_CHROMIUM, '/opt/chrome/chrome'], { override: '/opt/chrome/chrome' });
    expect(planBrowser(probes)).toEqual({ kind: 'found', path: '/opt/chrome/chrome' });
  });

  it('refuses a PORTWRIGHT_CHROMIUM that is not a program, even as root with Debian\'s installed', () => {
    const plan = planBrowser(machine([DEBIAN_CHROMIUM], { override: '/opt/none', root: true }));
    expect(plan.kind).toBe('fail');
    if (plan.kind !== 'fail') return;
    expect(plan.message).toContain('"/opt/none"');
    expectOneLineFix(plan.message);
  });

  it('installs when missing on Debian as root', () => {
    expect(planBrowser(machine([], { root: true }))).toEqual({ kind: 'install' });
  });

  it('names sudo apt-get when missing on Debian without root', () => {
    const plan = planBrowser(machine([]));
    expect(plan.kind).toBe('fail');
    if (plan.kind !== 'fail') return;
    expect(plan.message).toContain('`sudo apt-get install chromium`');
    expectOneLineFix(plan.message);
  });

  it('never offers apt-get off Debian, even as root', () => {
    const plan = planBrowser(machine([], { debian: false, root: true }));
    expect(plan.kind).toBe('fail');
    if (plan.kind !== 'fail') return;
    expect(plan.message).not.toContain('apt-get');
    expectOneLineFix(plan.message);
  });
});

describe('prepareBrowser', () => {
  it('installs, says so, and returns the installed browser', () => {
    const installed = new Set<string>();
    const probes = machine([], { root: true, isProgram: (path) => installed.has(path) });
    const said: string[] = [];
    const path = prepareBrowser(probes, () => (installed.add(DEBIAN_CHROMIUM), null), (line) => said.push(line));
    expect(path).toBe(DEBIAN_CHROMIUM);
    expect(said).toHaveLength(2);
    expect(said[0]).toMatch(/^Installing Debian's chromium/);
  });

  it('never installs when a browser is there', () => {
    let installs = 0;
    const path = prepareBrowser(machine([DEBIAN_CHROMIUM], { root: true }), () => (installs++, null), () => {});
    expect([path, installs]).toEqual([DEBIAN_CHROMIUM, 0]);
  });

  it('fails with apt-get\'s reason in one line when the install fails', () => {
    const attempt = () => prepareBrowser(machine([], { root: true }), () => 'apt-get update failed: Temporary failure resolving deb.debian.org', () => {});
    expect(attempt).toThrow(/^Installing chromium did not work \(apt-get update failed: Temporary failure resolving deb\.debian\.org\): run `apt-get install chromium` yourself, or set PORTWRIGHT_CHROMIUM=\/path\/to\/chromium\.$/);
  });

  it('fails at once, installing nothing, when it may not install', () => {
    let installs = 0;
    expect(() => prepareBrowser(machine([]), () => (installs++, null), () => {})).toThrow(/sudo apt-get install chromium/);
    expect(installs).toBe(0);
  });
});

describe('chromiumPath', () => {
  it('returns the found browser and never installs (it names the fix instead)', () => {
    expect(chromiumPath(machine(['/usr/bin/chromium']))).toBe(DEBIAN_CHROMIUM);
    expect(() => chromiumPath(machine([], { root: true }))).toThrow(/^The browser checks need chromium.*PORTWRIGHT_CHROMIUM=\/path\/to\/chromium\.$/);
  });
});

describe('which runs need a browser', () => {
  it('is a run that includes a file under test/e2e', () => {
    expect(browserNeeded(['/w/test/solver/pcg.test.ts', '/w/test/e2e/app-csp.test.ts'])).toBe(true);
    expect(browserNeeded(['/w/test/solver/pcg.test.ts', '/w/test/app/csp.test.ts'])).toBe(false);
    expect(browserNeeded([])).toBe(false);
  });

  it('reads the file filters of `vitest run`, skipping the command and flags', () => {
    expect(cliFilters(['node', 'vitest.mjs', 'run', 'test/solver', '--reporter=dot', 'test/e2e/app-csp'])).toEqual(['test/solver', 'test/e2e/app-csp']);
    expect(cliFilters(['node', 'vitest.mjs', 'run'])).toEqual([]);
  });
});
