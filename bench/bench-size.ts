/** One benchmark size, run inside its own process: full-solve timings, phases, peak memory, SOR baseline. */
import { runInNewContext } from 'node:vm';
import { setFlagsFromString } from 'node:v8';
import { assemble, writeRhs, type Stencil } from '../src/solver/assemble.ts';
import { connectedCells } from '../src/solver/connectivity.ts';
import { buildMultigrid } from '../src/solver/multigrid/multigrid.ts';
import { pcg } from '../src/solver/pcg/pcg.ts';
import { paddedVector } from '../src/solver/pcg/operator.ts';
import { rasterise } from '../src/solver/rasterise/rasterise.ts';
import { markedLength } from '../src/solver/rasterise/checks.ts';
import { solveFlow, solveOnGrid } from '../src/solver/solve.ts';
import { MARK_INLET, type CutGrid, type SolveResult } from '../src/solver/types.ts';
import { wallSpeeds } from '../src/solver/wall-speeds.ts';
import { benchDomain } from './bench-problem.ts';
import { sor, sorFactor } from './sor.ts';

export interface SizeArgs {
  readonly cells: number;
  readonly runs: number;
  /** 'time': timings and SOR; 'memory': one solve after a full collection, for its peak memory alone. */
  readonly mode: 'time' | 'memory';
  /** 'scan' the SOR factor, use a given span count, or 'skip' SOR. */
  readonly sor: 'scan' | 'skip' | number;
}

export interface SizeReport {
  readonly cells: number;
  readonly nx: number;
  readonly ny: number;
  readonly iterations: number;
  readonly residual: number;
  readonly medianMs: number;
  readonly medianCpuMs: number;
  /** Peak resident set of a process that ran one solve (after a 16k-cell warm-up), MB. */
  readonly peakRssMb: number;
  /** Resident set of that process before its solve (runtime, loader, compiled code), MB. */
  readonly baselineRssMb: number;
  /** Typed-array memory the result holds (grid, potential, speed ratio, wall samples), MB. */
  readonly arrayBuffersMb: number;
  readonly phases: { rasterise: number; connect: number; solve: number; setup: number; pcg: number; walls: number };
  /** Median ms of the linear solve alone (multigrid set-up + PCG from zero), the part SOR replaces. */
  readonly linearMs: number;
  readonly sor: { omega: number; spans: number; sweeps: number; residual: number; converged: boolean; ms: number } | null;
}

const TOLERANCE = 1e-8;

setFlagsFromString('--expose-gc');
/** Full garbage collection between runs, so that a run's peak memory is its own and not its predecessors'. */
const collectGarbage = runInNewContext('gc') as () => void;
const SOR_LIMIT_MS = 60_000;
const MB = 1024 * 1024;

export type TimeReport = Omit<SizeReport, 'peakRssMb' | 'baselineRssMb' | 'arrayBuffersMb'>;
export type MemoryReport = Pick<SizeReport, 'peakRssMb' | 'baselineRssMb' | 'arrayBuffersMb'>;

export function runSize(args: SizeArgs): TimeReport | MemoryReport {
  return args.mode === 'memory' ? measureMemory(args.cells) : measureTime(args);
}

/** Timings as the app sees them: repeated solves in one warm process, the collector left to itself. */
function measureTime(args: SizeArgs): TimeReport {
  const domain = benchDomain();
  solveFlow(domain, { targetCells: 16_384 }); // compile the hot loops before timing
  const wall: number[] = [];
  const cpu: number[] = [];
  let last: SolveResult | null = null;
  for (let run = 0; run < args.runs; run++) {
    last = null;
    const t0 = performance.now();
    const c0 = process.cpuUsage();
    last = solveFlow(domain, { targetCells: args.cells, tolerance: TOLERANCE });
    const c = process.cpuUsage(c0);
    wall.push(performance.now() - t0);
    cpu.push((c.user + c.system) / 1000);
  }
  if (last === null) throw new Error('no benchmark runs');
  const { grid, iterations, residual } = last;
  last = null;
  const phases = timePhases(args.cells);
  const { stencil, b, bNorm, linearMs } = timeLinear(grid, args.runs);
  const sorReport = args.sor === 'skip' ? null : runSor(stencil, b, bNorm, grid, args.sor);
  return {
    cells: args.cells, nx: grid.nx, ny: grid.ny, iterations, residual, medianMs: median(wall), medianCpuMs: median(cpu),
    phases, linearMs, sor: sorReport,
  };
}

/** Peak memory of one solve in a fresh process (warmed up on a small grid, then fully collected). */
function measureMemory(cells: number): MemoryReport {
  const domain = benchDomain();
  solveFlow(domain, { targetCells: 16_384 });
  collectGarbage();
  const baselineRssMb = process.memoryUsage().rss / MB;
  const result = solveFlow(domain, { targetCells: cells, tolerance: TOLERANCE });
  const peakRssMb = process.resourceUsage().maxRSS / 1024;
  const { grid } = result;
  const arrays = [grid.cellFraction, grid.openX, grid.openY, grid.inletCoupling, grid.outletCoupling, result.phi, result.speedRatio];
  const bytes = [...arrays, ...result.walls.map((w) => w.samples)].reduce((sum, a) => sum + a.byteLength, 0);
  return { peakRssMb, baselineRssMb, arrayBuffersMb: bytes / MB };
}

/** One solve split into its phases, ms. */
function timePhases(cells: number): SizeReport['phases'] {
  const domain = benchDomain();
  let t = performance.now();
  const lap = () => {
    const now = performance.now();
    const ms = now - t;
    t = now;
    return ms;
  };
  const grid = rasterise(domain, cells);
  const rasteriseMs = lap();
  const mask = connectedCells(grid);
  const connect = lap();
  const solution = solveOnGrid(grid, { inletLength: markedLength(domain, MARK_INLET), mask });
  const solve = lap();
  wallSpeeds(domain, grid, solution.phi, solution.inletMeanSpeed);
  const walls = lap();
  const { setupMs, pcgMs } = timeLinearOnce(grid, mask);
  return { rasterise: rasteriseMs, connect, solve, setup: setupMs, pcg: pcgMs, walls };
}

function timeLinearOnce(grid: CutGrid, mask: Uint8Array): { setupMs: number; pcgMs: number; stencil: Stencil; b: Float64Array; bNorm: number } {
  const { nx, ny } = grid;
  const t0 = performance.now();
  const stencil = assemble(grid, mask);
  const mg = buildMultigrid(stencil);
  const t1 = performance.now();
  const x = new Float64Array(nx * ny);
  const r = new Float64Array(nx * ny);
  const bNorm = writeRhs(grid, mask, r);
  pcg(stencil, mg, x, r, bNorm, { p: paddedVector(nx, ny), z: paddedVector(nx, ny) }, { tolerance: TOLERANCE, maxIterations: 200 });
  const t2 = performance.now();
  const b = new Float64Array(nx * ny);
  writeRhs(grid, mask, b);
  return { setupMs: t1 - t0, pcgMs: t2 - t1, stencil, b, bNorm };
}

function timeLinear(grid: CutGrid, runs: number): { stencil: Stencil; b: Float64Array; bNorm: number; linearMs: number } {
  const mask = connectedCells(grid);
  const times: number[] = [];
  let last = timeLinearOnce(grid, mask);
  for (let run = 0; run < runs; run++) {
    last = timeLinearOnce(grid, mask);
    times.push(last.setupMs + last.pcgMs);
  }
  return { stencil: last.stencil, b: last.b, bNorm: last.bNorm, linearMs: median(times) };
}

/** SOR with the best of three factor spans (scan: one grid-crossing of sweeps each), or a given span. */
function runSor(stencil: Stencil, b: Float64Array, bNorm: number, grid: CutGrid, spansArg: 'scan' | number): SizeReport['sor'] {
  const x = paddedVector(grid.nx, grid.ny);
  let spans = typeof spansArg === 'number' ? spansArg : 1;
  if (spansArg === 'scan') {
    let best = Infinity;
    for (const candidate of [1, 2, 4]) {
      const trial = sor(stencil, b, bNorm, x, sorFactor(grid.nx, grid.ny, candidate), TOLERANCE, SOR_LIMIT_MS, 2 * Math.max(grid.nx, grid.ny));
      if (trial.residual < best) {
        best = trial.residual;
        spans = candidate;
      }
    }
  }
  const omega = sorFactor(grid.nx, grid.ny, spans);
  const run = sor(stencil, b, bNorm, x, omega, TOLERANCE, SOR_LIMIT_MS);
  return { omega, spans, ...run };
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
}
