import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { BIN, REPO, STACK_LINE, runBin, tempDir } from './helpers.ts';

const tmp = tempDir();
afterAll(() => tmp.cleanup());

describe('portwright solve (the real bin, in a child process)', () => {
  it('--json writes exactly one JSON object on stdout and nothing on stderr', () => {
    const ran = runBin(['solve', 'samples/short-side-compare.json', '--variant', 'generous short side', '--cells', '30000', '--json', '--probe', '20,51']);
    expect(ran.stderr).toBe('');
    expect(ran.code).toBe(0);
    expect(ran.stdout.trimStart().startsWith('{')).toBe(true);
    expect(ran.stdout.trimEnd().endsWith('}')).toBe(true);
    const report = JSON.parse(ran.stdout);
    expect(report.variant).toBe('generous short side');
    expect(report.probes[0].potential).toBeGreaterThan(0);
    expect(report.probes[0].potential).toBeLessThan(1);
  });

  it('ends quietly with exit 0 when its reader closes the pipe early (solve FILE | true)', () => {
    // `true` exits without reading, so the pipe is closed before the solve's first line is written.
    const ran = spawnSync('bash', ['-c', `"${process.execPath}" "${BIN}" solve samples/street-tight-short-side.json --cells 20000 | true; echo "exit $\{PIPESTATUS[0]}"`], {
      cwd: REPO, encoding: 'utf8', timeout: 60_000,
    });
    expect(ran.stderr).toBe('');
    expect(ran.stdout.trim()).toBe('exit 0');
  });

  it('prints the readable summary by default, the caution last', () => {
    const ran = runBin(['solve', 'samples/street-tight-short-side.json', '--cells', '30000']);
    expect(ran.code).toBe(0);
    expect(ran.stdout).toContain('walls (fastest wall flow, as a speed ratio;');
    expect(ran.stdout.trimEnd().split('\n').at(-1)).toMatch(/^Caution: ideal 2D flow.*confirm on a flow bench/);
  });

  it('is listed in the usage', () => {
    const ran = runBin(['--help']);
    expect(ran.code).toBe(0);
    expect(ran.stdout).toMatch(/\n\s+solve FILE \[--variant NAME\] \[--cells N\] \[--probe X,Y\]\.\.\. \[--json\] \[--tolerance T\]\s+solve the ideal flow/);
  });

  it('refuses a section with no outlet with exit 1 and no stack trace', () => {
    const doc = JSON.parse(readFileSync(join(REPO, 'samples/street-tight-short-side.json'), 'utf8'));
    // without its parts, or solve would regenerate the test bore and its outlet from their numbers
    delete doc.variants[0].parts;
    doc.variants[0].section.outline.edges[11] = { kind: 'line', role: 'wall' };
    const ran = runBin(['solve', tmp.write('no-outlet.json', JSON.stringify(doc))]);
    expect(ran.code).toBe(1);
    expect(ran.stdout).toBe('');
    expect(ran.stderr).toContain('The section has no outlet');
    expect(ran.stderr).not.toMatch(STACK_LINE);
  });

  it('refuses --cells 10 with exit 1', () => {
    const ran = runBin(['solve', 'samples/street-tight-short-side.json', '--cells', '10']);
    expect(ran.code).toBe(1);
    expect(ran.stderr).toBe('portwright solve: --cells must be a whole number from 1,000 to 16,000,000 (got "10"); the standard grid is 250,000\n');
  });
});
