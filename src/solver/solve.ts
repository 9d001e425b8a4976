/** The solve: rasterise, connect, assemble, warm start, MG-PCG, velocity, flux checks, wall speeds. */
import { assemble, writeRhs, type Stencil } from './assemble.ts';
import { connectedCells } from './connectivity.ts';
import { buildMultigrid } from './multigrid/multigrid.ts';
import { fullMultigridStart } from './multigrid/full-multigrid.ts';
import { pcg } from './pcg/pcg.ts';
import { residual } from './pcg/operator.ts';
import { rasterise } from './rasterise/rasterise.ts';
import { STATION_COUNT, stationFluxes, worstImbalance } from './stations-flux.ts';
import { type CutGrid, type FlowDomain, type SolveOptions, type SolveResult } from './types.ts';
import { boundaryFlux, speedRatio } from './velocity.ts';
import { inletSize } from './depth/depth-integral.ts';
import { peakSpeed, sharpConvexCorners } from './velocity-peak.ts';
import { wallSpeeds } from './wall-speeds.ts';
import { warmStartGuess } from './warm-start.ts';
import { ScratchArrays } from './scratch.ts';

export const DEFAULT_TOLERANCE = 1e-8;
export const DEFAULT_MAX_ITERATIONS = 200;

/**
 * The work arrays of solveFlow and solveOnGrid (mask, multigrid levels, conjugate-gradient vectors), kept for the
 * next solve of the same size; none of them is part of a result. A solve must not start another from its callbacks
 * (shouldStop, onIteration): the two would share these arrays.
 */
const SCRATCH = new ScratchArrays();

/** Thrown when shouldStop ended the solve: a newer request replaced this one. */
export class SolveSupersededError extends Error {
  readonly code = 'superseded';
  constructor(readonly iterations: number) {
    super('A newer request replaced this solve.');
    this.name = 'SolveSupersededError';
  }
}

/** The solve settings of SolveOptions (tolerance, iteration cap, warm start, stop check), on a ready grid. */
export interface GridSolveOptions extends Pick<SolveOptions, 'tolerance' | 'maxIterations' | 'warmStart' | 'shouldStop'> {
  /**
   * Total inlet length, length units: mean inlet speed = inlet flux / inletLength. On a grid with a depth, the
   * inlet's area instead (the integral of the depth along it, length units squared; inletSize).
   */
  readonly inletLength: number;
  /** Told the relative residual after every iteration. */
  readonly onIteration?: (iteration: number, relativeResidual: number) => void;
  /** Cells to solve, i + j * nx; default connectedCells(grid). */
  readonly mask?: Uint8Array;
  /** x, y pairs of sharp convex corners kept out of the peak (sharpConvexCorners); default none. */
  readonly corners?: Float64Array;
}

/** Everything of a SolveResult but the wall speeds (those need the domain). */
export type GridSolution = Omit<SolveResult, 'walls' | 'thinWalls'> & {
  /** False when the iteration cap came first. */
  readonly converged: boolean;
  /** Inlet and outlet flux at unit potential drop, per unit depth or with the depth (their mean is the conductance). */
  readonly inletFlux: number;
  readonly outletFlux: number;
};

/**
 * Solves a port section: the one entry point of the worker and the command line. Wall speeds are sampled unless
 * options.wallSpeeds is false.
 * Throws FlowSetupError for a section that cannot be solved, SolveSupersededError when shouldStop fired.
 */
export function solveFlow(domain: FlowDomain, options: SolveOptions): SolveResult {
  const grid = rasterise(domain, options.targetCells);
  stopIfSuperseded(options.shouldStop);
  const mask = connectedCells(grid, SCRATCH);
  const solution = solveOnGrid(grid, {
    inletLength: inletSize(domain),
    tolerance: options.tolerance,
    maxIterations: options.maxIterations,
    warmStart: options.warmStart,
    shouldStop: options.shouldStop,
    mask,
    corners: sharpConvexCorners(domain),
  });
  stopIfSuperseded(options.shouldStop, solution.iterations);
  // About a seventh of a 30k-cell drag solve; a picture without wall plots need not pay it.
  const walls = options.wallSpeeds === false ? [] : wallSpeeds(domain, grid, solution.phi, solution.inletMeanSpeed);
  return { ...solution, walls, thinWalls: grid.thinWalls };
}

/** Between phases too, so a superseded solve on a big grid does not finish its set-up or read-out first. */
function stopIfSuperseded(shouldStop: (() => boolean) | undefined, iterations = 0): void {
  if (shouldStop?.()) throw new SolveSupersededError(iterations);
}

/** Solves on a ready grid (tests, and solveFlow after rasterising). */
export function solveOnGrid(grid: CutGrid, options: GridSolveOptions): GridSolution {
  if (!(options.inletLength > 0)) throw new RangeError(`inletLength must be positive, got ${options.inletLength}`);
  const { nx, ny } = grid;
  const mask = options.mask ?? connectedCells(grid, SCRATCH);
  const stencil = assemble(grid, mask);
  const phi = new Float64Array(nx * ny);
  const r = new Float64Array(nx * ny);
  const bNorm = writeRhs(grid, mask, r);
  const padded = nx * (ny + 2); // cell k at k + nx (paddedVector)
  const work = { p: SCRATCH.float64('pcg.p', padded), z: SCRATCH.float64('pcg.z', padded) };
  const mg = buildMultigrid(stencil, { scratch: SCRATCH });
  // From an earlier field when given (the refine-after-drag path), else from the coarse levels' own solution.
  if (options.warmStart) warmStartGuess(options.warmStart, grid, mask, phi);
  else fullMultigridStart(mg, r, phi, work.z);
  const report = pcg(stencil, mg, phi, r, bNorm, work, {
    tolerance: options.tolerance ?? DEFAULT_TOLERANCE,
    maxIterations: options.maxIterations ?? DEFAULT_MAX_ITERATIONS,
    shouldStop: options.shouldStop,
    onIteration: options.onIteration,
  });
  if (report.stopped) throw new SolveSupersededError(report.iterations);
  const fields = fieldsFromPotential(stencil, grid, phi, r, work.p, bNorm, options);
  return { ...fields, iterations: report.iterations, converged: report.converged };
}

/**
 * Everything the result derives from a solved potential: true residual, boundary and station fluxes, speed ratio,
 * peak; then marks phi NaN outside the solve. @param r scratch of nx * ny, becomes the speed ratio (i + j * nx);
 * @param padded scratch padded vector.
 */
export function fieldsFromPotential(
  stencil: Stencil, grid: CutGrid, phi: Float64Array, r: Float64Array, padded: Float64Array, bNorm: number,
  options: Pick<GridSolveOptions, 'inletLength' | 'corners'>,
): Omit<GridSolution, 'iterations' | 'converged'> {
  // Report the true residual b - A phi, not the recurrence's.
  writeRhs(grid, stencil.active, r);
  padded.set(phi, grid.nx);
  const trueResidual = bNorm > 0 ? residual(stencil, padded, r, r) / bNorm : 0;
  const flux = boundaryFlux(stencil, grid, phi);
  const total = 0.5 * (flux.inlet + flux.outlet);
  const inletMeanSpeed = flux.inlet / options.inletLength;
  const fluxImbalance = worstImbalance(stationFluxes(stencil, grid, phi, STATION_COUNT), total);
  const speed = r;
  speedRatio(stencil, grid.h, phi, inletMeanSpeed, speed);
  const peak = peakSpeed(grid, speed, options.corners ?? new Float64Array(0));
  markUnsolved(stencil, phi);
  return {
    grid, phi, speedRatio: speed, residual: trueResidual, conductance: total, fluxImbalance, inletMeanSpeed, peak,
    inletFlux: flux.inlet, outletFlux: flux.outlet,
  };
}

/** Sets phi to NaN in every cell outside the solve (i + j * nx); whole row runs outside the active spans at once. */
function markUnsolved(s: Stencil, phi: Float64Array): void {
  const { nx, ny, active, rowStart, rowEnd } = s;
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx;
    phi.fill(NaN, rowK, rowK + rowStart[j]);
    phi.fill(NaN, rowK + rowEnd[j], rowK + nx);
    for (let k = rowK + rowStart[j], end = rowK + rowEnd[j]; k < end; k++) if (active[k] !== 1) phi[k] = NaN;
  }
}
