/** One benchmark size, run inside its own process: full-solve timings, phases, peak memory, SOR baseline. */
import { runInNewContext } from 'node:vm';
import { setFlagsFromString } from 'node:v8';
import { assemble, writeRhs, type Stencil } from '../src/solver/assemble.ts';
import { connectedCells } from '../src/solver/connectivity.ts';
import { buildMultigrid } from '../src/solver/multigrid/multigrid.ts';
import { fullMultigridStart } from '../src/solver/multigrid/full-multigrid.ts';
import { pcg } from '../src/solver/pcg/pcg.ts';
import { paddedVector } from '../src/solver/pcg/operator.ts';
import { rasterise } from '../src/solver/rasterise/rasterise.ts';
import { markedLength } from '../src/solver/rasterise/checks.ts';
import { fieldsFromPotential, solveFlow } from '../src/solver/solve.ts';
import { MARK_INLET, type CutGrid, type SolveResult } from '../src/solver/types.ts';
import { sharpConvexCorners } from '../src/solver/velocity-peak.ts';
import { wallSpeeds } from '../src/solver/wall-speeds.ts';
import { benchDomain } from './bench-problem.ts';
import { sor, sorFactor, sorPlan } from './sor.ts';

export interface SizeArgs {
  readonly cells: number;
  readonly runs: number;
  /** 'time': timings and SOR; 'memory': one solve after a full collection, for its peak memory alone. */
  readonly mode: 'time' | 'memory';
  /** Run the SOR baseline or skip it. */
  readonly sor: boolean;
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
  /** Median ms of each phase of solveFlow, run one after another as solveFlow does. */
  readonly phases: Phases;
  /** Median ms of the linear solve alone (multigrid set-up, full-multigrid start and PCG, as solveFlow runs them), the part SOR replaces. */
  readonly linearMs: number;
  readonly sor: { omega: number; rhoJ: number; factorIterations: number; sweeps: number; residual: number; converged: boolean; ms: number } | null;
}

/**
 * rasterise, connect (connectedCells), assemble, setup (multigrid hierarchy), pcg (start and MG-PCG iterations),
 * fields (true residual, fluxes, station check, speed ratio, peak), walls (wall speeds).
 */
export interface Phases {
  rasterise: number; connect: number; assemble: number; setup: number; pcg: number; fields: number; walls: number;
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
  const domain = benchDomain(args.cells);
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
  const phases = timePhases(args.cells, args.runs);
  const { stencil, b, bNorm, linearMs } = timeLinear(grid, args.runs);
  const sorReport = args.sor ? runSor(stencil, b, bNorm, grid) : null;
  return {
    cells: args.cells, nx: grid.nx, ny: grid.ny, iterations, residual, medianMs: median(wall), medianCpuMs: median(cpu),
    phases, linearMs, sor: sorReport,
  };
}

/** Peak memory of one solve in a fresh process (warmed up on a small grid, then fully collected). */
function measureMemory(cells: number): MemoryReport {
  const domain = benchDomain(cells);
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

/** solveFlow split into its phases: the median ms of each over `runs` solves. */
function timePhases(cells: number, runs: number): Phases {
  const domain = benchDomain(cells);
  const laps: Phases[] = [];
  for (let run = 0; run < runs; run++) {
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
    const stencil = assemble(grid, mask);
    const assembleMs = lap();
    const mg = buildMultigrid(stencil);
    const setup = lap();
    const { nx, ny } = grid;
    const phi = new Float64Array(nx * ny);
    const r = new Float64Array(nx * ny);
    const bNorm = writeRhs(grid, mask, r);
    const work = { p: paddedVector(nx, ny), z: paddedVector(nx, ny) };
    fullMultigridStart(mg, r, phi, work.z); // the start solveOnGrid makes without a warm start
    pcg(stencil, mg, phi, r, bNorm, work, { tolerance: TOLERANCE, maxIterations: 200 });
    const pcgMs = lap();
    const options = { inletLength: markedLength(domain, MARK_INLET), corners: sharpConvexCorners(domain) };
    const fields = fieldsFromPotential(stencil, grid, phi, r, work.p, bNorm, options);
    const fieldsMs = lap();
    wallSpeeds(domain, grid, fields.phi, fields.inletMeanSpeed);
    const walls = lap();
    laps.push({ rasterise: rasteriseMs, connect, assemble: assembleMs, setup, pcg: pcgMs, fields: fieldsMs, walls });
  }
  const keys = Object.keys(laps[0]) as (keyof Phases)[];
  return Object.fromEntries(keys.map((key) => [key, median(laps.map((l) => l[key]))])) as unknown as Phases;
}

function timeLinearOnce(grid: CutGrid, mask: Uint8Array): { setupMs: number; pcgMs: number; stencil: Stencil; b: Float64Array; bNorm: number } {
  const { nx, ny } = grid;
  const stencil = assemble(grid, mask);
  const t0 = performance.now();
  const mg = buildMultigrid(stencil);
  const t1 = performance.now();
  const x = new Float64Array(nx * ny);
  const r = new Float64Array(nx * ny);
  const bNorm = writeRhs(grid, mask, r);
  const work = { p: paddedVector(nx, ny), z: paddedVector(nx, ny) };
  fullMultigridStart(mg, r, x, work.z); // as solveOnGrid starts
  pcg(stencil, mg, x, r, bNorm, work, { tolerance: TOLERANCE, maxIterations: 200 });
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

/** Red-black SOR over the fluid cells with Young's optimum factor from the measured Jacobi radius (bench/sor.ts). */
function runSor(stencil: Stencil, b: Float64Array, bNorm: number, grid: CutGrid): SizeReport['sor'] {
  const plan = sorPlan(stencil);
  const factor = sorFactor(stencil, plan);
  const run = sor(stencil, plan, b, bNorm, paddedVector(grid.nx, grid.ny), factor.omega, TOLERANCE, SOR_LIMIT_MS);
  return { omega: factor.omega, rhoJ: factor.rhoJ, factorIterations: factor.iterations, ...run };
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
}
