/** Conjugate gradients preconditioned by one multigrid V-cycle per iteration. */
import type { Stencil } from '../assemble.ts';
import { applyMultigrid, type Multigrid } from '../multigrid/multigrid.ts';
import { residual, updateDirectionAndApply } from './operator.ts';
import { loadPadded, updateSolution } from './vectors.ts';

export interface PcgOptions {
  /** Stop when ||r|| / ||b|| <= tolerance. */
  readonly tolerance: number;
  /** Iteration cap; the loop never runs longer. */
  readonly maxIterations: number;
  /** Checked before every iteration; true stops at once (a newer request superseded this one). */
  readonly shouldStop?: () => boolean;
  /** Told the relative residual after every iteration (for convergence reports). */
  readonly onIteration?: (iteration: number, relativeResidual: number) => void;
}

export interface PcgReport {
  readonly iterations: number;
  /** Last relative residual ||r|| / ||b|| of the recurrence. */
  readonly residual: number;
  readonly converged: boolean;
  /** True when shouldStop ended the loop. */
  readonly stopped: boolean;
}

/** Scratch vectors, both padded (cell k at k + nx): search direction and preconditioned residual / A p. */
export interface PcgWork {
  readonly p: Float64Array;
  readonly z: Float64Array;
}

/**
 * Solves A x = b. On entry x holds the starting guess (0 in excluded cells) and r holds b; on exit x is
 * the solution and r the recurrence residual. Vectors x and r are i + j * nx.
 * @param bNorm ||b||_2, for the relative residual.
 */
export function pcg(
  s: Stencil, mg: Multigrid, x: Float64Array, r: Float64Array, bNorm: number, work: PcgWork, options: PcgOptions,
): PcgReport {
  const { p, z } = work;
  const { nx } = s;
  if (!(bNorm > 0)) {
    x.fill(0);
    return { iterations: 0, residual: 0, converged: true, stopped: false };
  }
  loadPadded(x, p, nx);
  let rel = residual(s, p, r, r) / bNorm;
  let iterations = 0;
  if (rel <= options.tolerance) return { iterations, residual: rel, converged: true, stopped: false };
  let rz = applyMultigrid(mg, r, z);
  let beta = 0;
  p.fill(0);
  while (iterations < options.maxIterations) {
    if (options.shouldStop?.()) return { iterations, residual: rel, converged: false, stopped: true };
    const pAp = updateDirectionAndApply(s, p, z, beta); // p = z + beta p; z = A p
    if (!(pAp > 0) || !(rz > 0)) break; // breakdown: no further progress possible in floating point
    const alpha = rz / pAp;
    rel = Math.sqrt(updateSolution(s, x, r, p, z, alpha)) / bNorm;
    iterations++;
    options.onIteration?.(iterations, rel);
    if (rel <= options.tolerance) break;
    const rzNext = applyMultigrid(mg, r, z);
    beta = rzNext / rz;
    rz = rzNext;
  }
  return { iterations, residual: rel, converged: rel <= options.tolerance, stopped: false };
}
