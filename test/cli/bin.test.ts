import { readFileSync, symlinkSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import { regionArea } from '../../src/geometry/index.ts';
import { caseSetup, CELLS_BY_DETAIL } from '../../src/study/index.ts';
import { BIN, REPO, STACK_LINE, runBin, tempDir } from './helpers.ts';

const tmp = tempDir();
afterAll(() => tmp.cleanup());

/** The fluid area of a sample's active variant as set up for its standard grid, as the command prints it. */
function kernelArea(sample: string): string {
  const doc = loadDocument(readFileSync(join(REPO, sample), 'utf8'));
  return regionArea(caseSetup(doc, { targetCells: CELLS_BY_DETAIL.standard }).domain).toFixed(1);
}

describe('portwright check (the real bin, in a child process)', () => {
  it.each(['samples/street-tight-short-side.json', 'samples/street-generous-short-side.json'])('accepts %s', (sample) => {
    const ran = runBin(['check', sample]);
    expect(ran.stderr).toBe('');
    expect(ran.code).toBe(0);
    expect(ran.stdout).toContain('units: mm');
    expect(ran.stdout).toContain(`fluid area: ${kernelArea(sample)} mm^2`);
    expect(ran.stdout).toContain(
      'walls: floor, short side, bowl (short side), throat (short side), seat (short side), deck (manifold side), ' +
        'bore wall (manifold side), bore wall (far side), deck (far side), seat (long side), throat (long side), ' +
        'bowl (long side), long side, valve head',
    );
    expect(ran.stdout).toMatch(/OK: 1 variant checked/);
  });

  it('refuses a broken file with exit 1, the problem named and no stack trace', () => {
    const doc = JSON.parse(readFileSync(join(REPO, 'samples/street-tight-short-side.json'), 'utf8'));
    doc.variants[0].section.outline.vertices[3].filletRadius = 'abc';
    const ran = runBin(['check', tmp.write('broken.json', JSON.stringify(doc, null, 2))]);
    expect(ran.code).toBe(1);
    expect(ran.stdout).toBe('');
    expect(ran.stderr).toContain('the file cannot be used:');
    expect(ran.stderr).toContain('variants[0].section.outline.vertices[3].filletRadius: must be a number >= 0 and <= 100000 (got "abc")');
    expect(ran.stderr).not.toMatch(STACK_LINE);
  });

  it('refuses a missing file with exit 1 and no stack trace', () => {
    const ran = runBin(['check', 'samples/no-such-section.json']);
    expect(ran.code).toBe(1);
    expect(ran.stderr).toBe('portwright check: cannot read samples/no-such-section.json: no such file\n');
  });

  it('refuses an unknown command with exit 1 and the usage', () => {
    const ran = runBin(['solve-all', 'x.json']);
    expect(ran.code).toBe(1);
    expect(ran.stderr).toContain('unknown command "solve-all"');
    expect(ran.stderr).toContain('check FILE');
  });

  it('lists the commands for --help, exit 0', () => {
    const ran = runBin(['--help']);
    expect(ran.code).toBe(0);
    expect(ran.stdout).toMatch(/commands:\n\s+check FILE\s+check a section file/);
  });

  it('works as `npm run portwright -- check FILE`', () => {
    const ran = runBin(['run', '-s', 'portwright', '--', 'check', 'samples/short-side-compare.json'], { command: 'npm', prefix: [] });
    expect(ran.code).toBe(0);
    expect(ran.stdout).toContain('variant "generous short side"');
  });

  it('works as an installed bin: a symlink run directly, from another folder', () => {
    mkdirSync(join(tmp.dir, 'node_modules', '.bin'), { recursive: true });
    const link = join(tmp.dir, 'node_modules', '.bin', 'portwright');
    symlinkSync(BIN, link);
    const ran = runBin(['check', join(REPO, 'test/fixtures/section-v1.json')], { command: link, prefix: [], cwd: tmp.dir });
    expect(ran.code).toBe(0);
    expect(ran.stdout).toContain('format version 1, upgraded to 5 on reading');
    expect(ran.stdout).toContain('units: inch');
    expect(ran.stdout).toMatch(/fluid area: \d+\.\d{4} inch\^2/);
  });
});
