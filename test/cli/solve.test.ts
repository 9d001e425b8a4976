import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';
import { IDEAL_FLOW_CAUTION } from '../../src/cli/solve-text.ts';
import { REPO, STACK_LINE, captureIO, tempDir } from './helpers.ts';

const tmp = tempDir();
afterAll(() => tmp.cleanup());

const TIGHT = join(REPO, 'samples/street-tight-short-side.json');
const GENEROUS = join(REPO, 'samples/street-generous-short-side.json');
/** A point in the straight part of the port, 20 mm in from the manifold face, mid-height (samples: y 30..72). */
const PORT_POINT = [20, 51] as const;
/** A point in the test bore, well below the valve (bore x 64..152, y -60..0). */
const BORE_POINT = [108, -40] as const;

async function solve(args: string[]) {
  const io = captureIO();
  const code = await run(['solve', ...args], io);
  return { code, out: io.stdout.join('\n'), err: io.stderr.join('\n'), lines: io.stdout };
}

/** A parsed solve --json report (checked field by field below). */
type Json = any;
const reports: Record<string, Json> = {};

beforeAll(async () => {
  for (const [key, file] of [['tight', TIGHT], ['generous', GENEROUS]]) {
    const ran = await solve([file, '--json', '--probe', PORT_POINT.join(','), '--probe', BORE_POINT.join(','), '--probe', '0,0']);
    expect(ran.code).toBe(0);
    expect(ran.err).toBe('');
    reports[key] = JSON.parse(ran.out);
  }
}, 60_000);

const wall = (report: Json, name: string): Json => report.walls.find((w: Json) => w.name === name);

describe('solve --json on the samples', () => {
  it.each(['tight', 'generous'])('%s short side: every key, with sane values', (key) => {
    const r = reports[key];
    for (const k of ['grid', 'iterations', 'residual', 'conductance', 'fluxImbalance', 'inletMeanSpeed', 'peak', 'walls', 'probes',
      'stations', 'tightest', 'slowShare', 'findings', 'units', 'variant']) expect(r, k).toHaveProperty(k);
    expect(r.units).toBe('mm');
    expect(r.variant).toBe(`${key} short side`);
    expect(r.grid.cells).toBe(r.grid.nx * r.grid.ny);
    // 250,000 target cells over the bounding box, one spare cell round it: within a few percent.
    expect(Math.abs(r.grid.cells / 250_000 - 1)).toBeLessThan(0.03);
    expect(r.grid.spacing).toBeGreaterThan(0);
    expect(r.residual).toBeLessThan(1e-7);
    expect(r.converged).toBe(true);
    expect(r.conductance).toBeGreaterThan(0);
    expect(r.fluxImbalance).toBeLessThan(1e-4);
    expect(r.peak.speedRatio).toBeGreaterThan(1);
    expect(r.stations.length).toBeGreaterThan(10);
    expect(r.slowShare).toBeGreaterThanOrEqual(0);
    expect(r.slowShare).toBeLessThan(1);
    expect(r.findings.every((f: unknown) => typeof f === 'string')).toBe(true);
    expect(r.tightest.width).toBeGreaterThan(0);
  });

  it.each(['tight', 'generous'])('%s: walls carry samples [x, y, s, ratio] and the detachment; short side included', (key) => {
    const r = reports[key];
    const names = r.walls.map((w: Json) => w.name);
    expect(names).toEqual(expect.arrayContaining([
      'floor', 'short side', 'bowl (short side)', 'seat (short side)', 'seat (long side)', 'bowl (long side)', 'long side', 'valve head',
    ]));
    // every wall of the sample has a name of its own: none is told apart by a number, as "seat (2)"
    expect(names.filter((n: string) => / \(\d+\)$/.test(n))).toEqual([]);
    for (const w of r.walls) {
      expect(w).toHaveProperty('detachment');
      expect(w.samples.length).toBeGreaterThan(1);
      expect(w.samples.every((s: unknown[]) => s.length === 4)).toBe(true);
      expect(w.peakSpeedRatio).toBe(Math.max(...w.samples.map((s: number[]) => s[3])));
    }
    const detach = wall(r, 'short side').detachment;
    if (detach !== null) expect(Object.keys(detach)).toEqual(['s', 'x', 'y', 'method', 'shapeFactor']);
    // The valve head is one closed island wall; the reading reads it from the point where the flow divides, both ways.
    expect(wall(r, 'valve head').sides.map((s: Json) => s.side).sort()).toEqual(['left of the flow', 'right of the flow']);
  });

  it.each(['tight', 'generous'])('%s: probes interpolate inside the flow and leave the numbers out for outside points', (key) => {
    const [port, bore, outside] = reports[key].probes;
    expect(port).toMatchObject({ x: PORT_POINT[0], y: PORT_POINT[1], inFluid: true });
    expect(port.potential).toBeGreaterThan(0);
    expect(port.potential).toBeLessThan(1);
    // Upstream in the straight port the flow is nearly uniform, so the speed ratio is near 1 [derived; REFERENCES.md 1b].
    expect(Math.abs(port.speedRatio - 1)).toBeLessThan(0.02);
    // Downstream in the bore the potential is lower than upstream in the port.
    expect(bore.potential).toBeGreaterThan(0);
    expect(bore.potential).toBeLessThan(port.potential);
    expect(outside).toEqual({ x: 0, y: 0, inFluid: false });
  });

  it('the tight short side runs faster over its short side than the generous one', () => {
    const tight = wall(reports.tight, 'short side').peakSpeedRatio;
    const generous = wall(reports.generous, 'short side').peakSpeedRatio;
    console.log(`short-side peak speed ratio (solve --json, 250,000 cells): tight ${tight}, generous ${generous}`);
    // A tighter turn speeds the flow on its inside (REFERENCES.md 1a: the inside of an ideal bend is fastest).
    expect(tight).toBeGreaterThan(generous);
  });
});

describe('solve, readable summary', () => {
  it('prints the grid, solve, walls, findings and probes, and ends with the caution', async () => {
    const { code, out, lines, err } = await solve([join(REPO, 'samples/short-side-compare.json'), '--variant', 'generous short side',
      '--cells', '40000', '--probe', '20,51', '--probe', '0,0']);
    expect(code).toBe(0);
    expect(err).toBe('');
    expect(lines[1]).toBe('  variant: "generous short side", units: mm');
    expect(out).toMatch(/grid: \d+ x \d+ \([\d,]+ cells, [\d,]+ in the flow\), spacing \d\.\d+ mm/);
    expect(out).toMatch(/solve: \d+ iterations, relative residual \d\.\de-\d+/);
    expect(out).toMatch(/conductance: 0\.\d+ per unit depth/);
    expect(out).toMatch(/peak speed ratio: \d\.\d\d at \(\d+\.\d, -?\d+\.\d\) mm/);
    expect(out).toMatch(/tightest section ahead of the valve: \d+\.\d mm wide/);
    expect(out).toMatch(/slow share: [\d.]+% of the port and bowl, [\d.]+% ahead of the valve \(the test bore is not judged\)/);
    expect(out).toMatch(/\n {2}short side +\d\.\d\d {2}(stays on|leaves at)/);
    expect(out).toMatch(/\n {4}left of the flow: fastest \d\.\d\d/);
    expect(out).toMatch(/\(20\.0, 51\.0\) mm: potential 0\.\d{4}, speed ratio \d\.\d\d/);
    expect(out).toContain('(0.0, 0.0) mm: outside the fluid');
    expect(lines.at(-1)).toBe(IDEAL_FLOW_CAUTION);
    expect(IDEAL_FLOW_CAUTION).toMatch(/ideal 2D flow.*confirm on a flow bench/);
  });

  it('solves the active variant when none is named', async () => {
    const { code, lines } = await solve([join(REPO, 'samples/short-side-compare.json'), '--cells', '5000']);
    expect(code).toBe(0);
    expect(lines[1]).toBe('  variant: "tight short side", units: mm');
  });

  it('says on stderr that a big grid is being solved, and keeps stdout one JSON object', async () => {
    const { code, out, err } = await solve([TIGHT, '--cells', '1000000', '--json', '--tolerance', '1e-6']);
    expect(code).toBe(0);
    expect(err).toBe(`portwright solve: solving ${TIGHT}, variant "tight short side" on about 1,000,000 cells...`);
    expect(JSON.parse(out).grid.cells).toBeGreaterThan(900_000);
  }, 60_000);
});

describe('solve refuses what it cannot use, with exit 1 and a plain message', () => {
  const sample = () => JSON.parse(readFileSync(TIGHT, 'utf8'));
  /**
   * The sample as drawn, without its parametric parts: solve regenerates the parts' geometry from their numbers,
   * which would undo a hand change to the valve, seat or test bore.
   */
  const asDrawn = () => {
    const doc = sample();
    delete doc.variants[0].parts;
    return doc;
  };
  /** The sample with its valve head moved up by dy mm. */
  const valveMoved = (dy: number) => {
    const doc = asDrawn();
    for (const v of doc.variants[0].section.islands[0].outline.vertices) v.at[1] += dy;
    return doc;
  };

  it('an unknown variant, naming the variants there are', async () => {
    const { code, err, out } = await solve([join(REPO, 'samples/short-side-compare.json'), '--variant', 'ported']);
    expect(code).toBe(1);
    expect(out).toBe('');
    expect(err).toBe(`portwright solve: ${join(REPO, 'samples/short-side-compare.json')}: There is no variant "ported"; the variants are: "tight short side", "generous short side".`);
  });

  it('--cells 10', async () => {
    const { code, err } = await solve([TIGHT, '--cells', '10']);
    expect(code).toBe(1);
    expect(err).toContain('--cells must be a whole number from 1,000 to 16,000,000 (got "10")');
  });

  it('a section with no outlet', async () => {
    const doc = asDrawn();
    doc.variants[0].section.outline.edges[11] = { kind: 'line', role: 'wall' };
    const { code, err, out } = await solve([tmp.write('no-outlet.json', JSON.stringify(doc)), '--json']);
    expect(code).toBe(1);
    expect(out).toBe('');
    expect(err).toMatch(/variant "tight short side" cannot be solved: The section has no outlet: mark the edge where the air leaves/);
    expect(err).not.toMatch(STACK_LINE);
  });

  it('a blocked passage (the valve seated to within rounding), with where it closes', async () => {
    // The sample's valve sits 10 mm off its seat; its 45-degree faces lie parallel to the seat's, so moving it up
    // by 10 mm less 1e-13 closes the gap to far below a cell without the outlines touching.
    const { code, err } = await solve([tmp.write('seated.json', JSON.stringify(valveMoved(10 - 1e-13))), '--cells', '20000']);
    expect(code).toBe(1);
    const where = err.match(/the passage closes near x = (-?[\d.]+), y = (-?[\d.]+)\..*\(x and y in mm\)$/);
    expect(where, err).not.toBeNull();
    const [x, y] = [Number(where![1]), Number(where![2])];
    // At one of the two seat faces: x 72..74 or 116..118.5, y 2..5 (the sample's seat geometry).
    expect((x > 71.5 && x < 74.5) || (x > 115.5 && x < 118.5)).toBe(true);
    expect(y).toBeGreaterThan(1.5);
    expect(y).toBeLessThan(5);
    expect(err).not.toMatch(STACK_LINE);
  });

  it('a geometry problem, naming the variant', async () => {
    const { code, err } = await solve([tmp.write('crossing.json', JSON.stringify(valveMoved(10.5)))]);
    expect(code).toBe(1);
    expect(err).toMatch(/variant "tight short side": The section outline \(edge \d+\) and island "valve head" \(edge \d+\) cross or touch/);
  });

  it('a file that is not a section, naming the file', async () => {
    const { code, err } = await solve(['--json', tmp.write('list.json', '[1, 2]')]);
    expect(code).toBe(1);
    expect(err).toMatch(/list\.json: the file cannot be used:\n {2}.*not a Portwright section file/);
    // The file is named even when a flag comes before it.
    expect(err).toMatch(/^portwright solve: \S*list\.json: the file cannot be used:/);
  });
});
