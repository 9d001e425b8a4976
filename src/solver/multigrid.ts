/** Geometric multigrid V-cycle on masked cut-cell levels, used as the conjugate-gradient preconditioner. */
import type { Stencil } from './assemble.ts';
import { neighbourIndex, prolongAddBilinear, restrictResidualBilinear } from './multigrid-bilinear.ts';
import { COARSEST_MAX_CELLS, factorCoarsest, solveCoarsest, type CoarsestSolver } from './multigrid-coarsest.ts';
import { correctProlongDirichlet, correctRestrictDirichlet, dirichletCells, type TransferPair } from './multigrid-dirichlet.ts';
import { COARSE_SCALE, coarsen } from './multigrid-levels.ts';
import { smoothColour, smoothRedFromZero } from './multigrid-smooth.ts';
import { prolongAdd, restrictResidual } from './multigrid-transfer.ts';
import { paddedVector } from './pcg-operator.ts';

interface Level {
  readonly stencil: Stencil;
  /** This level's correction, padded (cell k at k + nx); unused on the finest level. */
  readonly x: Float64Array;
  /** This level's right-hand side (restricted residual), i + j * nx; unused on the finest level. */
  readonly b: Float64Array;
  /** Transfers to the next coarser level; null on the coarsest. */
  readonly down: TransferPair | null;
}

export interface Multigrid {
  /** levels[0] is the finest. */
  readonly levels: readonly Level[];
  /** Direct solver of the last level, or null when it relaxes instead. */
  readonly coarsest: CoarsestSolver | null;
  /** Red-black sweep pairs before and after each coarse correction. */
  readonly sweeps: number;
  readonly transfer: Transfer;
}

/** 'bilinear': bilinear transfers with operator-dependent Dirichlet cells; 'constant': piecewise-constant (injection / sum). */
export type Transfer = 'bilinear' | 'constant';

export interface MultigridOptions {
  /** Sweep pairs before and after the coarse correction; default 1. */
  readonly sweeps?: number;
  /** Coarse coupling scale; default COARSE_SCALE. */
  readonly coarseScale?: number;
  /** Default 'bilinear'. */
  readonly transfer?: Transfer;
}

/** Sweep pairs on the coarsest level when its direct factor is unavailable. */
const COARSEST_RELAX_PAIRS = 40;

/** Builds the hierarchy: halve until the level has at most COARSEST_MAX_CELLS cells, then factor it. */
export function buildMultigrid(fine: Stencil, options: MultigridOptions = {}): Multigrid {
  const scale = options.coarseScale ?? COARSE_SCALE;
  const levels: Level[] = [];
  let s = fine;
  let x: Float64Array = new Float64Array(0);
  let b: Float64Array = new Float64Array(0);
  while (s.nx * s.ny > COARSEST_MAX_CELLS && (s.nx > 1 || s.ny > 1)) {
    const c = coarsen(s, scale);
    const down: TransferPair = {
      fine: s, coarse: c, colN: neighbourIndex(s.nx, c.nx), rowN: neighbourIndex(s.ny, c.ny), dirichlet: dirichletCells(s),
    };
    levels.push({ stencil: s, x, b, down });
    s = c;
    x = paddedVector(s.nx, s.ny);
    b = new Float64Array(s.nx * s.ny);
  }
  levels.push({ stencil: s, x, b, down: null });
  return { levels, coarsest: factorCoarsest(s), sweeps: options.sweeps ?? 1, transfer: options.transfer ?? 'bilinear' };
}

/**
 * z = M^-1 r, one V-cycle from a zero guess. Symmetric: red-black sweeps before, black-red after, and
 * restriction is the transpose of prolongation.
 * @param r residual, i + j * nx (0 in excluded cells). @param z padded output (cell k at k + nx).
 */
export function applyMultigrid(mg: Multigrid, r: Float64Array, z: Float64Array): void {
  vCycle(mg, 0, z, r);
}

function vCycle(mg: Multigrid, depth: number, x: Float64Array, b: Float64Array): void {
  const level = mg.levels[depth];
  const s = level.stencil;
  const t = level.down;
  if (t === null) {
    if (mg.coarsest) solveCoarsest(mg.coarsest, s.nx, b, x);
    else relaxSymmetric(s, x, b, COARSEST_RELAX_PAIRS);
    return;
  }
  const coarse = mg.levels[depth + 1];
  relax(s, x, b, mg.sweeps);
  if (mg.transfer === 'bilinear') {
    restrictResidualBilinear(s, x, b, t.coarse, coarse.b, t.colN, t.rowN);
    correctRestrictDirichlet(t, x, b, coarse.b);
  } else {
    restrictResidual(s, x, b, coarse.b, t.coarse.nx);
  }
  vCycle(mg, depth + 1, coarse.x, coarse.b);
  if (mg.transfer === 'bilinear') {
    prolongAddBilinear(s, x, t.coarse, coarse.x, t.colN, t.rowN);
    correctProlongDirichlet(t, x, coarse.x);
  } else {
    prolongAdd(s.nx, s.ny, x, coarse.x, t.coarse.nx);
  }
  relaxBack(s, x, b, mg.sweeps);
}

/** Pre-smoothing from a zero guess: `pairs` red-black sweep pairs. */
function relax(s: Stencil, x: Float64Array, b: Float64Array, pairs: number): void {
  smoothRedFromZero(s, x, b);
  smoothColour(s, x, b, 1);
  for (let n = 1; n < pairs; n++) {
    smoothColour(s, x, b, 0);
    smoothColour(s, x, b, 1);
  }
}

/** Post-smoothing, the adjoint of `relax`: black-red sweep pairs. */
function relaxBack(s: Stencil, x: Float64Array, b: Float64Array, pairs: number): void {
  for (let n = 0; n < pairs; n++) {
    smoothColour(s, x, b, 1);
    smoothColour(s, x, b, 0);
  }
}

/** Symmetric relaxation from zero (forward then backward), a symmetric stand-in for the direct solve. */
function relaxSymmetric(s: Stencil, x: Float64Array, b: Float64Array, pairs: number): void {
  relax(s, x, b, pairs);
  relaxBack(s, x, b, pairs);
}
