/** Geometric multigrid V-cycle on masked cut-cell levels, used as the conjugate-gradient preconditioner. */
import type { Stencil } from '../assemble.ts';
import { neighbourIndex, prolongRow } from './bilinear.ts';
import { restrictRow } from './restrict.ts';
import { COARSEST_MAX_CELLS, factorCoarsest, solveCoarsest, type CoarsestSolver } from './coarsest.ts';
import { correctProlongCell, correctRestrictCell, transferPair, type TransferPair } from './dirichlet.ts';
import { COARSE_SCALE, coarsen } from './levels.ts';
import { rowDot, smoothColour, smoothRedFromZeroRow, smoothRow } from './smooth.ts';
import type { ScratchArrays } from '../scratch.ts';
import { float64Of } from '../scratch.ts';

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
  /** Scale of the coarse couplings (MultigridOptions.coarseScale), for restricting a right-hand side. */
  readonly coarseScale: number;
  /** Where the hierarchy's arrays came from (MultigridOptions.scratch); the full-multigrid start takes its own there too. */
  readonly scratch: ScratchArrays | null;
}

export interface MultigridOptions {
  /** Sweep pairs before and after the coarse correction; default 1. */
  readonly sweeps?: number;
  /** Coarse coupling scale; default COARSE_SCALE. */
  readonly coarseScale?: number;
  /**
   * Take the coarse levels' arrays from here instead of allocating them; the hierarchy is then valid only until the
   * next one is built from the same scratch. Default none.
   */
  readonly scratch?: ScratchArrays;
}

/** Sweep pairs on the coarsest level when its direct factor is unavailable. */
const COARSEST_RELAX_PAIRS = 40;

/** Builds the hierarchy: halve until the level has at most COARSEST_MAX_CELLS cells, then factor it. */
export function buildMultigrid(fine: Stencil, options: MultigridOptions = {}): Multigrid {
  const scale = options.coarseScale ?? COARSE_SCALE;
  const scratch = options.scratch ?? null;
  const levels: Level[] = [];
  let s = fine;
  let x: Float64Array = new Float64Array(0);
  let b: Float64Array = new Float64Array(0);
  while (s.nx * s.ny > COARSEST_MAX_CELLS && (s.nx > 1 || s.ny > 1)) {
    const depth = levels.length + 1;
    const c = coarsen(s, scale, scratch, depth);
    levels.push({ stencil: s, x, b, down: transferPair(s, c, neighbourIndex(s.ny, c.ny), scratch, depth) });
    s = c;
    x = float64Of(scratch, `mg${depth}.x`, s.nx * (s.ny + 2)); // padded
    b = float64Of(scratch, `mg${depth}.b`, s.nx * s.ny);
  }
  levels.push({ stencil: s, x, b, down: null });
  return { levels, coarsest: factorCoarsest(s), sweeps: Math.max(1, options.sweeps ?? 1), coarseScale: scale, scratch };
}

/**
 * z = M^-1 r, one V-cycle from a zero guess; returns r . z. Symmetric: red-black sweeps before, black-red
 * after, and restriction is the transpose of prolongation.
 * @param r residual, i + j * nx (0 in excluded cells). @param z padded output (cell k at k + nx).
 */
export function applyMultigrid(mg: Multigrid, r: Float64Array, z: Float64Array): number {
  return vCycle(mg, 0, z, r);
}

/**
 * As applyMultigrid, on level `depth` (0 = finest) with that level's r (i + j * nx) and z (padded; 0 outside
 * the level's active spans on entry). Uses the coarser levels' vectors as scratch.
 */
export function applyMultigridAt(mg: Multigrid, depth: number, r: Float64Array, z: Float64Array): number {
  return vCycle(mg, depth, z, r);
}

function vCycle(mg: Multigrid, depth: number, x: Float64Array, b: Float64Array): number {
  const level = mg.levels[depth];
  const s = level.stencil;
  if (level.down === null) {
    if (mg.coarsest) solveCoarsest(mg.coarsest, s.nx, b, x);
    else relaxSymmetric(s, x, b, COARSEST_RELAX_PAIRS);
    let dot = 0;
    for (let j = 0; j < s.ny; j++) dot += rowDot(s, b, x, j);
    return dot;
  }
  const coarse = mg.levels[depth + 1];
  preSmoothAndRestrict(level.down, mg.sweeps, x, b, coarse.b);
  vCycle(mg, depth + 1, coarse.x, coarse.b);
  return prolongAndPostSmooth(level.down, mg.sweeps, x, b, coarse.x);
}

/**
 * Pre-smoothing from zero, then coarse rhs = P^T (b - A x), in one pass over the rows for one sweep pair:
 * red row j, black row j - 1, restrict row j - 2 (each only needs rows already final). Same result as
 * separate whole-grid passes, with a third of the memory traffic.
 */
function preSmoothAndRestrict(t: TransferPair, sweeps: number, x: Float64Array, b: Float64Array, coarseB: Float64Array): void {
  const s = t.fine;
  const ny = s.ny;
  coarseB.fill(0);
  for (let j = 0; j < ny + 2; j++) {
    if (j < ny) smoothRedFromZeroRow(s, x, b, j);
    if (j >= 1 && j <= ny) smoothRow(s, x, b, j - 1, 1);
    if (sweeps === 1 && j >= 2) restrictWithDirichlet(t, x, b, coarseB, j - 2);
  }
  if (sweeps === 1) return;
  for (let n = 1; n < sweeps; n++) {
    smoothColour(s, x, b, 0);
    smoothColour(s, x, b, 1);
  }
  for (let j = 0; j < ny; j++) restrictWithDirichlet(t, x, b, coarseB, j);
}

/**
 * x += P xc, then black-red post-smoothing, in one pass for one sweep pair: prolong row j, black row j - 1,
 * red row j - 2. Returns b . x (on the finest level that is r . z for the conjugate gradients).
 */
function prolongAndPostSmooth(t: TransferPair, sweeps: number, x: Float64Array, b: Float64Array, coarseX: Float64Array): number {
  const s = t.fine;
  const ny = s.ny;
  const rowPtr = s.dirichlet.rowPtr;
  let dot = 0;
  for (let j = 0; j < ny + 2; j++) {
    if (j < ny) {
      prolongRow(s, x, j, t.coarse, t.strength, coarseX, t.rowN[j]);
      for (let m = rowPtr[j]; m < rowPtr[j + 1]; m++) correctProlongCell(t, x, coarseX, m);
    }
    if (j >= 1 && j <= ny) smoothRow(s, x, b, j - 1, 1);
    if (j >= 2) {
      smoothRow(s, x, b, j - 2, 0);
      if (sweeps === 1) dot += rowDot(s, b, x, j - 2);
    }
  }
  if (sweeps === 1) return dot;
  for (let n = 1; n < sweeps; n++) {
    smoothColour(s, x, b, 1);
    smoothColour(s, x, b, 0);
  }
  for (let j = 0; j < ny; j++) dot += rowDot(s, b, x, j);
  return dot;
}

/** Restricts row j and applies the corrections of its red Dirichlet cells (black ones have zero residual). */
function restrictWithDirichlet(t: TransferPair, x: Float64Array, b: Float64Array, coarseB: Float64Array, j: number): void {
  restrictRow(t.fine, x, b, j, t.coarse, t.strength, coarseB, t.rowN[j]);
  const { cells, rowPtr } = t.fine.dirichlet;
  const nx = t.fine.nx;
  for (let m = rowPtr[j]; m < rowPtr[j + 1]; m++) {
    if (((cells[m] - j * nx + j) & 1) === 0) correctRestrictCell(t, x, b, coarseB, m);
  }
}

/** Symmetric relaxation from zero (red-black pairs, then black-red pairs), a stand-in for the direct solve. */
function relaxSymmetric(s: Stencil, x: Float64Array, b: Float64Array, pairs: number): void {
  for (let j = 0; j < s.ny; j++) smoothRedFromZeroRow(s, x, b, j);
  smoothColour(s, x, b, 1);
  for (let n = 1; n < pairs; n++) {
    smoothColour(s, x, b, 0);
    smoothColour(s, x, b, 1);
  }
  for (let n = 0; n < pairs; n++) {
    smoothColour(s, x, b, 1);
    smoothColour(s, x, b, 0);
  }
}
