/** Finds the chromium the browser tests and benchmarks drive, and decides what to do when there is none. */
import { spawnSync } from 'node:child_process';
import { accessSync, constants, existsSync, statSync } from 'node:fs';
import { delimiter, join } from 'node:path';

/** Where Debian's chromium package puts the browser. */
export const DEBIAN_CHROMIUM = '/usr/bin/chromium';

/** Environment variable naming another chromium or Chrome to drive instead. */
export const CHROMIUM_ENV = 'PORTWRIGHT_CHROMIUM';

/** What the machine says about itself; injected so the decision is tested without uninstalling anything. */
export interface MachineProbes {
  /** PORTWRIGHT_CHROMIUM, if set and not empty. */
  readonly override: string | undefined;
  /** Directories of PATH, in order. */
  readonly searchPath: readonly string[];
  /** Whether `path` is a file this process may run. */
  isProgram(path: string): boolean;
  /** /etc/debian_version exists (Debian or a derivative, with apt-get). */
  readonly debian: boolean;
  /** The process runs as root (uid 0), so apt-get may install. */
  readonly root: boolean;
}

/** What to do before the browser tests: use a browser, install Debian's, or stop with one line naming the fix. */
export type BrowserPlan =
  | { readonly kind: 'found'; readonly path: string }
  | { readonly kind: 'install' }
  | { readonly kind: 'fail'; readonly message: string };

const FIX_OVERRIDE = `set ${CHROMIUM_ENV}=/path/to/chromium`;

/** The browser to drive: PORTWRIGHT_CHROMIUM alone when set, otherwise Debian's, otherwise `chromium` on PATH. */
export function findChromium(machine: MachineProbes): string | null {
  if (machine.override !== undefined) return machine.isProgram(machine.override) ? machine.override : null;
  const candidates = [DEBIAN_CHROMIUM, ...machine.searchPath.map((dir) => join(dir, 'chromium'))];
  return candidates.find((path) => machine.isProgram(path)) ?? null;
}

/** Decides from the probes alone; every failure is one line that names the fix. */
export function planBrowser(machine: MachineProbes): BrowserPlan {
  const path = findChromium(machine);
  if (path !== null) return { kind: 'found', path };
  if (machine.override !== undefined) {
    return {
      kind: 'fail',
      message: `${CHROMIUM_ENV} is set to "${machine.override}", which is not a program: point it at a chromium or Chrome, or unset it to use Debian's chromium.`,
    };
  }
  if (machine.debian && machine.root) return { kind: 'install' };
  if (machine.debian) {
    return {
      kind: 'fail',
      message: `The browser tests need chromium, which is not installed: run \`sudo apt-get install chromium\`, or ${FIX_OVERRIDE}.`,
    };
  }
  return {
    kind: 'fail',
    message: `The browser tests need chromium, which was not found: install Chromium or Chrome and ${FIX_OVERRIDE}.`,
  };
}

/** The probes of this machine and process. */
export function machineProbes(env: NodeJS.ProcessEnv = process.env): MachineProbes {
  const override = env[CHROMIUM_ENV] ? env[CHROMIUM_ENV] : undefined;
  return {
    override,
    searchPath: (env.PATH ?? '').split(delimiter).filter((dir) => dir !== ''),
    isProgram,
    debian: existsSync('/etc/debian_version'),
    root: process.getuid?.() === 0,
  };
}

function isProgram(path: string): boolean {
  try {
    accessSync(path, constants.X_OK);
    return statSync(path).isFile();
  } catch {
    return false;
  }
}

/** The chromium to launch; throws the one-line fix when there is none (nothing is installed from here). */
export function chromiumPath(machine: MachineProbes = machineProbes()): string {
  const plan = planBrowser(machine);
  if (plan.kind === 'found') return plan.path;
  if (plan.kind === 'fail') throw new Error(plan.message);
  throw new Error(`The browser checks need chromium, which is not installed: run \`apt-get install chromium\` (\`npm test\` does it for you), or ${FIX_OVERRIDE}.`);
}

/** Runs apt-get; returns null when it worked, otherwise the last line apt-get wrote to stderr. */
export type Installer = () => string | null;

/** Installs Debian's chromium with apt-get (root only), quietly; apt-get's own errors are kept for the message. */
export const aptInstallChromium: Installer = () => {
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update', '-qq'], ['install', '-y', '-qq', 'chromium']]) {
    const run = spawnSync('apt-get', args, { env, stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8' });
    if (run.status !== 0) {
      const said = (run.stderr ?? '').trim().split('\n').pop() || run.error?.message || `exit code ${run.status}`;
      return `apt-get ${args[0]} failed: ${said}`;
    }
  }
  return null;
};

/**
 * Makes sure a chromium is there before any browser test starts: finds it, or installs Debian's when the process
 * may, with a progress line. Returns its path; throws one line naming the fix otherwise.
 */
export function prepareBrowser(
  machine: MachineProbes = machineProbes(),
  install: Installer = aptInstallChromium,
  say: (line: string) => void = (line) => process.stdout.write(`${line}\n`),
): string {
  const plan = planBrowser(machine);
  if (plan.kind === 'found') return plan.path;
  if (plan.kind === 'fail') throw new Error(plan.message);
  say("Installing Debian's chromium for the browser tests with apt-get (about 110 MB to download).");
  const failure = install();
  const path = findChromium(machine);
  if (failure === null && path !== null) {
    say(`chromium installed at ${path}.`);
    return path;
  }
  const why = (failure ?? `apt-get finished but there is no ${DEBIAN_CHROMIUM}`).replace(/[.\s]+$/, '');
  throw new Error(`Installing chromium did not work (${why}): run \`apt-get install chromium\` yourself, or ${FIX_OVERRIDE}.`);
}

/** Whether any of the test files about to run drives a browser (they live in test/e2e). */
export function browserNeeded(testFiles: readonly string[]): boolean {
  return testFiles.some((file) => /(^|[\\/])test[\\/]e2e[\\/]/.test(file));
}

/** The file filters given to `vitest run` on its command line (flag values become filters no file matches). */
export function cliFilters(argv: readonly string[]): string[] {
  const commands = new Set(['run', 'watch', 'dev', 'related', 'list']);
  return argv.slice(2).filter((arg) => !arg.startsWith('-') && !commands.has(arg));
}
