import { mkdirSync, readFileSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { LAYOUT, buildBundle, bundlePath, bundleState, type BuildLayout } from '../../bin/cli-build.js';
import { captureIO, REPO, tempDir } from '../cli/helpers.ts';

const tmp = tempDir();
afterAll(() => tmp.cleanup());

/** File times in seconds since 1970, as utimesSync takes them. */
const BUILD_STARTED_S = 2_000_000_000;

/**
 * A layout with a bundle built at BUILD_STARTED_S from the entry src/cli/main.ts (an hour older) and a.ts, last changed
 * at `sourceChangedS`.
 */
function fakeLayout(name: string, sourceChangedS: number): BuildLayout {
  const layout = { repo: join(tmp.dir, name), outDir: join(tmp.dir, name, 'out') };
  mkdirSync(layout.outDir, { recursive: true });
  mkdirSync(join(layout.repo, 'src', 'cli'), { recursive: true });
  writeFileSync(join(layout.repo, 'src', 'cli', 'main.ts'), "export * from '../../a.ts';\n");
  utimesSync(join(layout.repo, 'src', 'cli', 'main.ts'), BUILD_STARTED_S - 3600, BUILD_STARTED_S - 3600);
  writeFileSync(join(layout.repo, 'a.ts'), 'export const a = 1;\n');
  utimesSync(join(layout.repo, 'a.ts'), sourceChangedS, sourceChangedS);
  writeFileSync(join(layout.outDir, 'portwright.js'), 'export const run = () => 0;\n');
  const stamp = { startedMs: BUILD_STARTED_S * 1000, inputs: ['src/cli/main.ts', 'a.ts', 'gone.ts'] };
  writeFileSync(join(layout.outDir, 'build.json'), JSON.stringify(stamp));
  return layout;
}

describe('bundleState: is the built command current?', () => {
  it('is current when every source is older than the build', () => {
    expect(bundleState(fakeLayout('older', BUILD_STARTED_S - 3600))).toBeNull();
  });

  it('is stale when a source changed after the build started', () => {
    expect(bundleState(fakeLayout('newer', BUILD_STARTED_S + 1))).toBe('stale');
  });

  it('is stale when a source changed just before the build started (coarse file times)', () => {
    expect(bundleState(fakeLayout('same-time', BUILD_STARTED_S - 0.05))).toBe('stale');
  });

  it('is current in a packed copy, which ships the bundle without its sources', () => {
    const packed = fakeLayout('packed', BUILD_STARTED_S + 1);
    rmSync(join(packed.repo, 'src'), { recursive: true });
    expect(bundleState(packed)).toBeNull();
  });

  it('is missing without a build record or without the bundle', () => {
    const noStamp = fakeLayout('no-stamp', BUILD_STARTED_S - 3600);
    rmSync(join(noStamp.outDir, 'build.json'));
    expect(bundleState(noStamp)).toBe('missing');
    const noBundle = fakeLayout('no-bundle', BUILD_STARTED_S - 3600);
    rmSync(join(noBundle.outDir, 'portwright.js'));
    expect(bundleState(noBundle)).toBe('missing');
  });
});

describe('buildBundle', () => {
  it('the project bundle is current once the test setup has run', () => {
    expect(bundleState(LAYOUT)).toBeNull();
  });

  it('writes one self-contained module that runs the command, and records its sources', async () => {
    const layout = { repo: REPO, outDir: join(tmp.dir, 'built') };
    await buildBundle(layout);
    expect(bundleState(layout)).toBeNull();
    const bundle = readFileSync(bundlePath(layout), 'utf8');
    // Only Node's own modules are imported at run time: the project and zod are inside the file.
    const imports = [...bundle.matchAll(/^import .* from "([^"]+)";$/gm)].map((m) => m[1]);
    expect(imports.length).toBeGreaterThan(0);
    expect(imports.every((name) => name.startsWith('node:'))).toBe(true);
    const { inputs } = JSON.parse(readFileSync(join(layout.outDir, 'build.json'), 'utf8'));
    expect(inputs).toEqual(expect.arrayContaining(['src/cli/main.ts', 'src/solver/solve.ts', 'bin/cli-build.js', 'package-lock.json']));
    expect(inputs.some((path: string) => path.includes('node_modules'))).toBe(false);
    const cli = await import(pathToFileURL(bundlePath(layout)).href);
    const io = captureIO();
    expect(await cli.run(['--help'], io)).toBe(0);
    expect(io.stdout.join('\n')).toMatch(/commands:\n\s+check FILE/);
  });
});
