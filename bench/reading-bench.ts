/**
 * Flow-reading benchmark (npm run bench:reading): readFlow on the standard grid (250,000 cells) of a sample, whole
 * and part by part, medians of repeated runs in one warm process, and the first call in the process (the code not yet
 * optimised: the first release after the app opens). The parts are timed by running the same steps readFlow runs,
 * one at a time, so their sum is close to, not exactly, the whole (garbage collection lands where it lands).
 * Wall-clock and CPU time (user + system of the process, garbage collection threads included) are printed side by
 * side: on a shared machine the wall clock mostly measures the other work, the CPU time much less so.
 * Environment: BENCH_SAMPLE=samples/other.json, BENCH_CELLS=250000, BENCH_RUNS=21.
 */
import { readFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { loadDocument } from '../src/document/index.ts';
import { caseSetup } from '../src/study/index.ts';
import { solveFlow } from '../src/solver/index.ts';
import { readFlow } from '../src/solver/reading/index.ts';
import { wallDetachments } from '../src/solver/reading/detachment.ts';
import { extendedPhi } from '../src/solver/reading/field.ts';
import { findings } from '../src/solver/reading/findings.ts';
import { readingSettings } from '../src/solver/reading/options.ts';
import { overWideStations } from '../src/solver/reading/over-wide.ts';
import { cellDepths, passageModel, portVolume } from '../src/solver/reading/port-volume.ts';
import { RingIndex } from '../src/solver/reading/ring-index.ts';
import { slowZones } from '../src/solver/reading/slow-zones.ts';
import { buildStations, evenLevels, tightestStation } from '../src/solver/reading/stations.ts';
import { traceStreamlines } from '../src/solver/reading/streamlines.ts';
import { valvePotential } from '../src/solver/reading/valve-level.ts';
import { downstreamWalls } from '../src/solver/reading/wall-paths.ts';
import { readWall } from '../src/solver/reading/walls.ts';
import type { WallReading } from '../src/solver/reading/types.ts';

const sample = process.env.BENCH_SAMPLE ?? 'samples/street-tight-short-side.json';
const cells = Number(process.env.BENCH_CELLS ?? 250_000);
const runs = Number(process.env.BENCH_RUNS ?? 21);

const doc = loadDocument(readFileSync(fileURLToPath(new URL(`../${sample}`, import.meta.url)), 'utf8'));
const setup = caseSetup(doc, { targetCells: cells });
const domain = setup.domain;
const result = solveFlow(domain, { targetCells: cells });
const options = setup.reading;
const settings = readingSettings(options);
const { grid } = result;

/** Medians of `runs` wall-clock and CPU timings of `work` in ms, after one warm-up run; returns the last result too. */
function median<T>(work: () => T): { ms: number; cpuMs: number; value: T } {
  let value = work();
  const times: number[] = [];
  const cpu: number[] = [];
  for (let r = 0; r < runs; r++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    value = work();
    times.push(performance.now() - t0);
    const used = process.cpuUsage(c0);
    cpu.push((used.user + used.system) / 1000);
  }
  const mid = (list: number[]): number => list.sort((a, b) => a - b)[(list.length - 1) >> 1];
  return { ms: mid(times), cpuMs: mid(cpu), value };
}

const firstC0 = process.cpuUsage();
const firstT0 = performance.now();
readFlow(domain, result, options);
const firstMs = performance.now() - firstT0;
const firstUsed = process.cpuUsage(firstC0);
const firstCpuMs = (firstUsed.user + firstUsed.system) / 1000;
const solve = median(() => solveFlow(domain, { targetCells: cells }));
const whole = median(() => readFlow(domain, result, options));
const phi = median(() => extendedPhi(grid, result.phi));
const index = median(() => new RingIndex(grid, domain));
const input = { domain, grid, phi: phi.value, index: index.value, conductance: result.conductance, inletMeanSpeed: result.inletMeanSpeed };
const stations = median(() => buildStations(input, evenLevels(settings.stationCount), settings.deck));
const valve = median(() => valvePotential(domain, grid, phi.value, settings.valveIslandName));
const paths = median(() => downstreamWalls(result.walls, grid, phi.value));
const valvePhi = valve.value;
const valveWall = valvePhi === null ? null : { phi: valvePhi, name: settings.valveIslandName };
const depthAtCells = cellDepths(grid, domain.depth);
const slow = median(() => slowZones(grid, result.phi, result.speedRatio, stations.value, settings.slowFraction, valvePhi, settings.deck, depthAtCells));
const overWide = median(() => overWideStations(stations.value, valvePhi, settings.overWideThreshold, settings.overWideWindow));
const walls = median(() => paths.value.map((p) => readWall(p, valveWall)).filter((w): w is WallReading => w !== null));
const detach = median(() => wallDetachments(paths.value, settings));
const lines = median(() => traceStreamlines(domain, grid, result.phi, index.value, settings.streamlineCount));
const volume = median(() => portVolume(grid, cellDepths(grid, domain.depth), settings.deck));
const partial = {
  model: passageModel(domain.depth), portVolume: volume.value, stations: stations.value, valvePhi, tightest: tightestStation(stations.value, valvePhi), slow: slow.value, overWide: overWide.value,
  walls: walls.value, detachments: detach.value, streamlines: lines.value,
};
const told = median(() => findings(partial, settings, grid.h));

const fmt = (ms: number): string => `${ms.toFixed(1).padStart(7)} ms`;
console.log(`Portwright reading benchmark: ${sample}, ${grid.nx} x ${grid.ny} = ${grid.nx * grid.ny} cells, median of ${runs} runs, ` +
  `load average ${loadavg().map((l) => l.toFixed(1)).join(' ')}`);
console.log(`${''.padEnd(16)}   wall       CPU`);
console.log(`solve           ${fmt(solve.ms)}${fmt(solve.cpuMs)}`);
console.log(`readFlow        ${fmt(whole.ms)}${fmt(whole.cpuMs)}`);
console.log(`  first call    ${fmt(firstMs)}${fmt(firstCpuMs)}`);
for (const [name, t] of [
  ['extended phi', phi], ['ring index', index], ['stations', stations], ['valve level', valve], ['wall paths', paths],
  ['slow zones', slow], ['port volume', volume], ['over-wide', overWide], ['wall readings', walls], ['detachment', detach],
  ['streamlines', lines], ['findings', told],
] as const) console.log(`  ${name.padEnd(14)}${fmt(t.ms)}${fmt(t.cpuMs)}`);
