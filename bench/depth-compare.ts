/** Benchmark line: the whole solve of the sample with and without a passage depth, in one warm process, interleaved. */
import { bounds } from '../src/solver/rasterise/checks.ts';
import { solveFlow } from '../src/solver/solve.ts';
import type { FlowDomain } from '../src/solver/types.ts';
import { benchDomain } from './bench-problem.ts';

export interface DepthReport {
  readonly cells: number;
  readonly runs: number;
  /** Median wall-clock ms and PCG iterations of each case: no depth, axisymmetric, sampled. */
  readonly plain: { ms: number; iterations: number };
  readonly axisymmetric: { ms: number; iterations: number };
  readonly sampled: { ms: number; iterations: number };
}

/**
 * The sample three ways: as it is; round about a line 5 length units below its box (b = 2 pi r, r from 5 to about
 * 137 mm); and with a sampled depth on a 16 x 16 lattice over its box, 30 to 50 units wide along x with a gentle
 * ripple across (made-up numbers of a port's width, a stand-in for the study's width profile).
 */
export function depthCases(cells: number): Record<'plain' | 'axisymmetric' | 'sampled', FlowDomain> {
  const plain = benchDomain(cells);
  const [xmin, ymin, xmax, ymax] = bounds(plain);
  const n = 16;
  const dx = (xmax - xmin) / (n - 1);
  const dy = (ymax - ymin) / (n - 1);
  const values = Float64Array.from({ length: n * n }, (_, k) => 30 + (20 * (k % n)) / (n - 1) + 2 * Math.sin(Math.floor(k / n)));
  return {
    plain,
    axisymmetric: { ...plain, depth: { kind: 'axisymmetric', axis: { x: 0, y: ymin - 5, dirX: 1, dirY: 0 } } },
    sampled: { ...plain, depth: { kind: 'sampled', x0: xmin, y0: ymin, dx, dy, nx: n, ny: n, values } },
  };
}

/** Runs each case `runs` times in turn (after one warm-up of each) and reports medians. */
export function compareDepth(cells: number, runs: number): DepthReport {
  const cases = depthCases(cells);
  const names = ['plain', 'axisymmetric', 'sampled'] as const;
  const times: Record<string, number[]> = { plain: [], axisymmetric: [], sampled: [] };
  const iterations: Record<string, number> = {};
  for (const name of names) solveFlow(cases[name], { targetCells: cells });
  for (let run = 0; run < runs; run++) {
    for (const name of names) {
      const t0 = performance.now();
      iterations[name] = solveFlow(cases[name], { targetCells: cells, tolerance: 1e-8 }).iterations;
      times[name].push(performance.now() - t0);
    }
  }
  const entry = (name: string) => ({ ms: median(times[name]), iterations: iterations[name] });
  return { cells, runs, plain: entry('plain'), axisymmetric: entry('axisymmetric'), sampled: entry('sampled') };
}

/** One line for the benchmark's output. */
export function describeDepth(r: DepthReport): string {
  const part = (name: string, c: { ms: number; iterations: number }) =>
    `${name} ${c.ms.toFixed(0)} ms (${c.iterations} iterations, ${(c.ms / r.plain.ms).toFixed(2)}x)`;
  return `Depth, ${r.cells.toLocaleString('en-US')} cells, medians of ${r.runs}: no depth ${r.plain.ms.toFixed(0)} ms ` +
    `(${r.plain.iterations} iterations); ${part('axisymmetric', r.axisymmetric)}; ${part('sampled 16 x 16', r.sampled)}`;
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
}
