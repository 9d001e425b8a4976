/** solve's areas: the model, station areas, the least area and the port volume, in JSON and in words. */
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';
import { buildSolveReport, type SolvedVariant } from '../../src/cli/solve-report.ts';
import { jsonLines } from '../../src/cli/json-text.ts';
import { solveReportLines, WIDTH_FLOW_CAUTION } from '../../src/cli/solve-text.ts';
import { readingSummary } from '../../src/solver/reading/index.ts';
import { solveCase } from '../../src/study/index.ts';
import { channelWithDepth, depthAlongX } from '../solver/depth/depth-shapes.ts';
import { REPO, captureIO } from './helpers.ts';

/** Every number in a parsed report finite (null only where a whole object may be missing). */
function nonFinite(value: unknown, path = ''): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
  if (value === null) return ['tightest', 'leastArea', 'detachment', 'crossoverLift', 'breathing', 'port'].includes(path.slice(path.lastIndexOf('.') + 1)) ? [] : [path];
  if (Array.isArray(value)) return value.flatMap((item, k) => nonFinite(item, `${path}[${k}]`));
  if (typeof value === 'object') return Object.entries(value as object).flatMap(([key, item]) => nonFinite(item, `${path}.${key}`));
  return [];
}

describe('a hand-built width model: channel 40 x 10 mm, width 20 mm at the inlet falling linearly to 10 mm [derived]', () => {
  // Station areas are 10 mm x b(x); the least is at the outlet end; the volume is 10 x (20 + 10) / 2 x 40 = 6000 mm^3.
  const b = (x: number) => 20 - x / 4;
  const domain = channelWithDepth(40, 10, depthAlongX(40, 11, b));
  const { result, reading } = solveCase(domain, { targetCells: 80 * 20, tolerance: 1e-10 }, { stationCount: 10 });
  const solved: SolvedVariant = {
    title: 'Tapered channel', variant: 'base', units: 'mm', model: 'width', domain, result, summary: readingSummary(reading!),
    converged: true, breathing: null, notes: [],
  };
  const report = buildSolveReport(solved, []);
  const json = JSON.parse(jsonLines(report).join('\n'));

  it('writes model, stations[].area, leastArea and portVolume, every number finite', () => {
    expect(json.model).toBe('width');
    expect(nonFinite(json)).toEqual([]);
    json.stations.forEach((s: { area: number }, k: number) => expect(s.area).toBeCloseTo(10 * b(reading!.stations[k].midX), 3));
    const last = json.stations.at(-1);
    expect(json.leastArea.area).toBe(last.area);
    expect(Object.keys(json.leastArea)).toEqual(['area', 'x1', 'y1', 'x2', 'y2']);
    expect([json.leastArea.y1, json.leastArea.y2].sort((p: number, q: number) => p - q)).toEqual([0, 10]);
    expect(json.portVolume).toBeCloseTo(6000, 6);
  });

  it('names the model and prints the least area and port volume in mm² and mm³', () => {
    const lines = solveReportLines(report);
    expect(lines[2]).toBe('  model: width profile');
    expect(lines).toContain('  port volume: 6000 mm³ (the port and bowl above the deck)');
    expect(lines.find((l) => l.startsWith('  least area'))).toMatch(/^ {2}least area ahead of the valve: 10\d\.\d mm², from \(3\d\.\d, \d+\.0\) mm to/);
    expect(lines.find((l) => l.startsWith('  conductance'))).toMatch(/^ {2}conductance: \d+(\.\d+)? mm \(flux per unit potential drop\)$/);
    expect(lines.at(-1)).toBe(WIDTH_FLOW_CAUTION);
  });

  it('prints in² and in³ for an inch file, and per inch of depth in the plane model', () => {
    const inch = solveReportLines({ ...report, units: 'inch' });
    expect(inch).toContain('  port volume: 6000 in³ (the port and bowl above the deck)');
    const plane = solveReportLines({ ...report, units: 'inch', model: 'plane' });
    expect(plane).toContain('  port volume: 6000 in³ per in of depth (the port and bowl above the deck)');
    expect(plane.find((l) => l.startsWith('  least area'))).toMatch(/ in² per in of depth, from /);
    expect(plane[2]).toBe('  model: plane, per unit depth');
  });
});

describe('solve --json on a sample without a width profile', () => {
  it('is the plane model: area = width x 1 at every station, the least area the tightest width, volume the fluid area', async () => {
    const io = captureIO();
    expect(await run(['solve', join(REPO, 'samples/street-tight-short-side.json'), '--cells', '20000', '--json'], io)).toBe(0);
    const json = JSON.parse(io.stdout.join('\n'));
    expect(json.model).toBe('plane');
    for (const s of json.stations) expect(s.area).toBe(s.width);
    expect(json.leastArea.area).toBe(json.tightest.width);
    expect([json.leastArea.x1, json.leastArea.y1, json.leastArea.x2, json.leastArea.y2]).toEqual([json.tightest.x1, json.tightest.y1, json.tightest.x2, json.tightest.y2]);
    expect(json.portVolume).toBeGreaterThan(0);
    expect(nonFinite(json)).toEqual([]);
    expect(json.breathing.port).toBeNull();
  }, 30_000);
});

describe('solve on the sample with a width profile (samples/street-port-widths.json), through the file', () => {
  const file = join(REPO, 'samples/street-port-widths.json');

  it('is the width model: station areas, the least area ranked as the port area, the port volume in mm³', async () => {
    const io = captureIO();
    expect(await run(['solve', file, '--cells', '60000', '--json'], io)).toBe(0);
    const json = JSON.parse(io.stdout.join('\n'));
    expect(json.model).toBe('width');
    expect(nonFinite(json)).toEqual([]);
    // The runner's profile is 30-34 mm wide [the sample's own numbers], so the least area is its width across the
    // section times about that; no station's mean depth passes the profile's widest, the 88 mm bore.
    const ratio = json.leastArea.area / json.tightest.width;
    expect(ratio).toBeGreaterThan(29);
    expect(ratio).toBeLessThan(35);
    for (const s of json.stations) expect(s.area / s.width).toBeLessThanOrEqual(88.001);
    expect(Math.min(...json.stations.map((s: { area: number }) => s.area))).toBeLessThanOrEqual(json.leastArea.area);
    expect(json.breathing.port).toEqual({ name: 'port (least area, width profile)', area: json.leastArea.area, source: 'solved least area of the width profile' });
    expect(json.portVolume).toBeGreaterThan(30 * 4000); // more than the runner's plan area alone at its least width [rough]
  }, 30_000);

  it('names the model and prints the least area, the port volume and the port area ranked', async () => {
    const io = captureIO();
    expect(await run(['solve', file, '--cells', '60000'], io)).toBe(0);
    const out = io.stdout.join('\n');
    expect(io.stdout[2]).toBe('  model: width profile');
    expect(out).toMatch(/\n {2}least area ahead of the valve: \d{4} mm², from /);
    expect(out).toMatch(/\n {2}port volume: \d+ mm³ \(the port and bowl above the deck\)/);
    expect(out).toMatch(/\n {2}slow share by volume: /);
    expect(out).toMatch(/\n {2}port area ranked: \d+\.\d mm\^2 \(solved least area of the width profile\)/);
    expect(io.stdout.at(-1)).toBe(WIDTH_FLOW_CAUTION);
  }, 30_000);
});
