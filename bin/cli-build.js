#!/usr/bin/env node
// Builds the headless command into one ES module (dist-cli/portwright.js) with esbuild, and says whether that build is current.
import { existsSync, mkdirSync, readFileSync, realpathSync, renameSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';

const REPO = fileURLToPath(new URL('../', import.meta.url));
/**
 * Where the command is built from and to: `repo` holds src/cli/main.ts; `outDir` receives portwright.js (src/cli/main.ts
 * and everything it imports, zod included: one file costs less CPU to load than zod's 95) with its source map, and
 * build.json, what it was built from: { startedMs, inputs: paths relative to `repo` }, written after the bundle.
 */
export const LAYOUT = { repo: REPO, outDir: join(REPO, 'dist-cli') };
/** The bundled command of a layout. */
export const bundlePath = (layout = LAYOUT) => join(layout.outDir, 'portwright.js');
const stampPath = (layout) => join(layout.outDir, 'build.json');
/** The command's entry, relative to the layout's repo. */
const ENTRY = join('src', 'cli', 'main.ts');
/** Beside the sources, what else the bundle depends on: this file (how it is built) and the lock file (zod's version). */
const BUILD_INPUTS = [relative(REPO, fileURLToPath(import.meta.url)), 'package-lock.json'];
/** A source changed this little before a build started counts as changed after it: file times are coarse. */
const CLOCK_MARGIN_MS = 100;

/**
 * Why the bundle cannot be used as it is: 'missing' (never built), 'stale' (a source it
 * was built from changed since the build started), or null when it is current. A source that no longer exists is not
 * counted: the module that imported it changed too. Costs one stat per source file (about 140).
 */
export function bundleState(layout = LAYOUT) {
  if (!existsSync(bundlePath(layout)) || !existsSync(stampPath(layout))) return 'missing';
  // Installed from a packed copy (package.json "files"), the sources are not there: the shipped bundle is the command.
  if (!existsSync(join(layout.repo, ENTRY))) return null;
  let stamp;
  try {
    stamp = JSON.parse(readFileSync(stampPath(layout), 'utf8'));
  } catch {
    return 'missing';
  }
  for (const input of stamp.inputs) {
    let changedMs;
    try {
      changedMs = statSync(join(layout.repo, input)).mtimeMs;
    } catch {
      continue;
    }
    if (changedMs >= stamp.startedMs - CLOCK_MARGIN_MS) return 'stale';
  }
  return null;
}

/**
 * Bundles the command with esbuild (a development dependency) and returns the build's wall time in ms. The bundle and
 * its stamp are written to temporary names and renamed into place, so a command started meanwhile reads either the
 * old files or the new ones, never half a file.
 */
export async function buildBundle(layout = LAYOUT) {
  const startedMs = Date.now();
  const esbuild = await import('esbuild');
  const result = await esbuild.build({
    absWorkingDir: layout.repo,
    entryPoints: [join(layout.repo, ENTRY)],
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    sourcemap: 'linked',
    sourcesContent: false,
    metafile: true,
    write: false,
    outfile: bundlePath(layout),
    logLevel: 'warning',
  });
  // Paths relative to absWorkingDir, the repository; npm packages are covered by the lock file.
  const sources = Object.keys(result.metafile.inputs).filter((path) => !path.includes('node_modules/'));
  const inputs = [...sources, ...BUILD_INPUTS];
  mkdirSync(layout.outDir, { recursive: true });
  for (const file of result.outputFiles) writeAtomically(file.path, file.contents);
  writeAtomically(stampPath(layout), `${JSON.stringify({ startedMs, inputs }, null, 1)}\n`);
  return Date.now() - startedMs;
}

/** Writes `contents` beside `path` under a name of this process's own, then renames it over `path`. */
function writeAtomically(path, contents) {
  const temporary = join(dirname(path), `.${process.pid}.${Math.random().toString(36).slice(2)}.tmp`);
  writeFileSync(temporary, contents);
  renameSync(temporary, path);
}

/** Builds the bundle when it is missing or stale; returns what was done, for a note. */
export async function ensureBundle(layout = LAYOUT) {
  const state = bundleState(layout);
  if (state === null) return null;
  return { state, ms: await buildBundle(layout) };
}

// Run as a script (npm run build:cli, and npm's prepare after install): always build.
if (process.argv[1] !== undefined && realpathSync(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const ms = await buildBundle();
  process.stdout.write(`portwright: built ${relative(REPO, bundlePath())} in ${ms} ms\n`);
}
