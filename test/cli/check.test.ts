import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';
import { MAX_FILE_BYTES } from '../../src/document/limits.ts';
import { REPO, STACK_LINE, captureIO, tempDir } from './helpers.ts';

const tmp = tempDir();
afterAll(() => tmp.cleanup());
const sample = () => JSON.parse(readFileSync(join(REPO, 'samples/street-tight-short-side.json'), 'utf8'));

async function check(path: string) {
  const io = captureIO();
  const code = await run(['check', path], io);
  return { code, out: io.stdout.join('\n'), err: io.stderr.join('\n') };
}

describe('check (in process)', () => {
  it('summarises every variant of a file with two', async () => {
    const { code, out, err } = await check(join(REPO, 'samples/short-side-compare.json'));
    expect(code).toBe(0);
    expect(err).toBe('');
    expect(out).toContain('variants: 2, active: "tight short side"');
    expect(out).toContain('variant "tight short side" (active)');
    expect(out).toContain('variant "generous short side"\n');
    expect(out).toContain('edges: 21 in the outline (1 inlet, 1 outlet, 19 wall), 12 in islands');
    expect(out).toContain('islands: 1 (valve head)');
    expect(out.match(/fluid area: \d+\.\d mm\^2/g)).toHaveLength(2);
  });

  it('accepts a version-3 file and a version-4 one with bench inputs (both upgraded on reading)', async () => {
    const v3 = await check(join(REPO, 'test/fixtures/section-v3.json'));
    expect(v3.code).toBe(0);
    expect(v3.out).toContain('(format version 3, upgraded to 5 on reading)');
    const v4 = await check(join(REPO, 'test/fixtures/section-v3-as-v4.json'));
    expect(v4.code).toBe(0);
    expect(v4.out).toContain('(format version 4, upgraded to 5 on reading)');
    expect(v4.out).toContain('OK: 1 variant checked, no problems');
  });

  it('reports a geometry problem per variant with exit 1', async () => {
    const doc = sample();
    doc.variants[0].section.outline.vertices[3].filletRadius = 60;
    const { code, out, err } = await check(tmp.write('big-fillet.json', JSON.stringify(doc)));
    expect(code).toBe(1);
    expect(out).toMatch(/problem: .*fillet/i);
    expect(out).not.toContain('fluid area');
    expect(err).toContain('1 of 1 variant cannot be solved: "tight short side"');
    expect(err + out).not.toMatch(STACK_LINE);
  });

  it('judges the parts as solve regenerates them, not only the stored geometry', async () => {
    const doc = sample();
    // A test bore narrower than the 46 mm valve: the stored section still looks fine, the parts cannot be made.
    doc.variants[0].parts.bore.diameter = 40;
    const { code, out, err } = await check(tmp.write('narrow-bore.json', JSON.stringify(doc)));
    expect(code).toBe(1);
    expect(out).toMatch(/problem: .*bore/);
    expect(out).not.toContain('fluid area');
    expect(err).toContain('1 of 1 variant cannot be solved');
  });

  it('says when there is no outlet', async () => {
    const doc = sample();
    doc.variants[0].section.outline.edges[11] = { kind: 'line', role: 'wall' };
    const { code, out } = await check(tmp.write('no-outlet.json', JSON.stringify(doc)));
    expect(code).toBe(1);
    expect(out).toContain('problem: The outline has no outlet edge (role "outlet", the far end of the bore): the flow has nowhere to leave.');
  });

  it('names the position of a JSON syntax error', async () => {
    const { code, err } = await check(tmp.write('cut.json', readFileSync(join(REPO, 'samples/street-tight-short-side.json'), 'utf8').slice(0, 700)));
    expect(code).toBe(1);
    expect(err).toMatch(/not valid JSON at line \d+, column \d+/);
  });

  it('names the file that cannot be used, then its problems, one line a write', async () => {
    const io = captureIO();
    const path = tmp.write('list.json', '[1, 2]');
    expect(await run(['check', path], io)).toBe(1);
    expect(io.stderr[0]).toBe(`portwright check: ${path}: the file cannot be used:`);
    expect(io.stderr[1]).toMatch(/^ {2}this is not a Portwright section file/);
    expect(io.stderr.filter((line) => line.includes('\n'))).toEqual([]);
  });

  it('refuses a file too big to be a section before reading it, in the loader\'s words', async () => {
    const { code, err } = await check(tmp.write('huge.json', ' '.repeat(MAX_FILE_BYTES + 100_000)));
    expect(code).toBe(1);
    expect(err).toMatch(/huge\.json is too big \(5\.1 MB\); a section file is at most 5\.0 MB$/);
  });

  it('refuses an endless input (a device whose size says 0) once it has read more than a section may hold', async () => {
    const { code, err } = await check('/dev/zero');
    expect(code).toBe(1);
    expect(err).toMatch(/\/dev\/zero is too big \(more than 5\.0 MB\); a section file is at most 5\.0 MB$/);
  });

  it('says a newer file needs a newer Portwright', async () => {
    const { code, err } = await check(tmp.write('newer.json', JSON.stringify({ ...sample(), version: 7 })));
    expect(code).toBe(1);
    expect(err).toContain('format version 7, written by a newer Portwright');
  });

  it('refuses a folder, and a wrong number of arguments', async () => {
    expect((await check(tmp.dir)).err).toContain('is a folder, not a section file');
    const io = captureIO();
    expect(await run(['check'], io)).toBe(1);
    expect(await run(['check', 'a.json', 'b.json'], io)).toBe(1);
    expect(io.stderr.join('\n')).toContain('check takes one file (got 2 arguments)');
  });

  it('prints its own usage for check --help', async () => {
    const io = captureIO();
    expect(await run(['check', '--help'], io)).toBe(0);
    expect(io.stdout[0]).toBe('usage: portwright check FILE');
  });
});
