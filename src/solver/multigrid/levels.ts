/** Coarse levels by 2x2 cell agglomeration: face conductances and Dirichlet couplings summed, then scaled. */
import { rowSpans, type Stencil } from '../assemble.ts';
import { dirichletList } from '../assemble-dirichlet.ts';
import { float64Of, uint8Of, type ScratchArrays } from '../scratch.ts';

/**
 * Scale applied to the summed couplings of a coarse level.
 * Summing the two fine faces under a coarse face is the Galerkin product P^T A P for piecewise-constant
 * P; in 2D that is twice what the coarse grid's own finite-volume operator would be (a coarse face is
 * twice as long, but its centres are twice as far apart), so the coarse correction would come out half
 * size. Scaling by 1/2 makes the coarse operator the rediscretised one (McAdams, Sifakis & Teran, SCA 2010,
 * likewise rediscretise on coarse levels rather than form Galerkin products [memory]). Any positive scale keeps the V-cycle preconditioner symmetric positive definite
 * (the coarse-grid step only adds a positive semidefinite term to the smoother's error operator); the
 * scale only decides how effective it is. 1/2 measured best: PCG iterations on a 512^2 channel and on the
 * 256k-cell port sample were 24 and 28 at 0.35, 9 and 11 at 0.5, 17 and 22 at 0.65 (the channel case is
 * checked in test/solver/pcg.test.ts).
 */
export const COARSE_SCALE = 0.5;

/**
 * Builds the coarse stencil of `fine` (ncx = ceil(nx / 2), ncy = ceil(ny / 2); odd sizes leave one-child rows).
 * Its arrays come from `scratch` (slots named by `depth`, the coarse level's number) when given.
 */
export function coarsen(fine: Stencil, scale: number = COARSE_SCALE, scratch: ScratchArrays | null = null, depth = 1): Stencil {
  const { nx, ny } = fine;
  const ncx = (nx + 1) >> 1;
  const ncy = (ny + 1) >> 1;
  const faceX = coarseFacesX(fine, float64Of(scratch, `mg${depth}.faceX`, (ncx + 1) * ncy), scale);
  const faceY = coarseFacesY(fine, float64Of(scratch, `mg${depth}.faceY`, ncx * (ncy + 1)), scale);
  const active = uint8Of(scratch, `mg${depth}.active`, ncx * ncy);
  for (let j = 0; j < ny; j++) {
    const row = j * nx;
    const rowC = (j >> 1) * ncx;
    for (let i = fine.rowStart[j], end = fine.rowEnd[j]; i < end; i++) if (fine.active[row + i] === 1) active[(i >> 1) + rowC] = 1;
  }
  const coarse = { nx: ncx, ny: ncy, dirichlet: coarseDirichlet(fine, ncx, ncy, scale), faceX, faceY, active, ...rowSpans(active, ncx, ncy) };
  return fine.depthScale === undefined ? coarse : { ...coarse, depthScale: fine.depthScale };
}

/** Sums the children's Dirichlet couplings into their parents, scaled like the faces. */
function coarseDirichlet(fine: Stencil, ncx: number, ncy: number, scale: number) {
  const sums = new Map<number, number>();
  const { cells, coupling } = fine.dirichlet;
  for (let m = 0; m < cells.length; m++) {
    const i = cells[m] % fine.nx;
    const j = (cells[m] - i) / fine.nx;
    const c = (i >> 1) + (j >> 1) * ncx;
    sums.set(c, (sums.get(c) ?? 0) + scale * coupling[m]);
  }
  return dirichletList([...sums.keys()], [...sums.values()], ncx, ncy);
}

/**
 * Coarse x-face I between coarse cells I - 1 and I covers fine x-face 2I in fine rows 2J and 2J + 1.
 * @param out zeroed, (ncx + 1) * ncy, I + J * (ncx + 1).
 */
function coarseFacesX(fine: Stencil, out: Float64Array, scale: number): Float64Array {
  const { nx, ny, faceX } = fine;
  const ncx = (nx + 1) >> 1;
  const ncy = (ny + 1) >> 1;
  for (let J = 0; J < ncy; J++) {
    for (let I = 1; I < ncx; I++) {
      const i = 2 * I;
      let sum = faceX[i + 2 * J * (nx + 1)];
      if (2 * J + 1 < ny) sum += faceX[i + (2 * J + 1) * (nx + 1)];
      out[I + J * (ncx + 1)] = scale * sum;
    }
  }
  return out;
}

/**
 * Coarse y-face J between coarse rows J - 1 and J covers fine y-face row 2J in fine columns 2I and 2I + 1.
 * @param out zeroed, ncx * (ncy + 1), I + J * ncx.
 */
function coarseFacesY(fine: Stencil, out: Float64Array, scale: number): Float64Array {
  const { nx, ny, faceY } = fine;
  const ncx = (nx + 1) >> 1;
  const ncy = (ny + 1) >> 1;
  for (let J = 1; J < ncy; J++) {
    const row = 2 * J * nx;
    for (let I = 0; I < ncx; I++) {
      const i = 2 * I;
      let sum = faceY[i + row];
      if (i + 1 < nx) sum += faceY[i + 1 + row];
      out[I + J * ncx] = scale * sum;
    }
  }
  return out;
}
