/** Coarse levels by 2x2 cell agglomeration: face conductances and Dirichlet couplings summed, then scaled. */
import { rowSpans, type Stencil } from './assemble.ts';

/**
 * Scale applied to the summed couplings of a coarse level.
 * Summing the two fine faces under a coarse face is the Galerkin product P^T A P for piecewise-constant
 * P; in 2D that is twice what the coarse grid's own finite-volume operator would be (a coarse face is
 * twice as long, but its centres are twice as far apart), so the coarse correction would come out half
 * size. Scaling by 1/2 makes the coarse operator the rediscretised one (McAdams, Sifakis & Teran, SCA 2010
 * coarsen the same way). Any positive scale keeps the V-cycle preconditioner symmetric positive definite
 * (the coarse-grid step only adds a positive semidefinite term to the smoother's error operator); the
 * scale only decides how effective it is. 1/2 measured best on rectangles and bends (see tests).
 */
export const COARSE_SCALE = 0.5;

/** Builds the coarse stencil of `fine` (ncx = ceil(nx / 2), ncy = ceil(ny / 2); odd sizes leave one-child rows). */
export function coarsen(fine: Stencil, scale: number = COARSE_SCALE): Stencil {
  const { nx, ny } = fine;
  const ncx = (nx + 1) >> 1;
  const ncy = (ny + 1) >> 1;
  const faceX = coarseFacesX(fine, ncx, ncy, scale);
  const faceY = coarseFacesY(fine, ncx, ncy, scale);
  const active = new Uint8Array(ncx * ncy);
  const dirichlet = childDirichlet(fine, active, ncx);
  const diag = new Float64Array(ncx * ncy);
  for (let J = 0; J < ncy; J++) {
    for (let I = 0; I < ncx; I++) {
      const c = I + J * ncx;
      const fx = I + J * (ncx + 1);
      diag[c] = active[c] === 1
        ? faceX[fx] + faceX[fx + 1] + faceY[c] + faceY[c + ncx] + scale * dirichlet[c]
        : 1;
    }
  }
  return { nx: ncx, ny: ncy, diag, faceX, faceY, active, ...rowSpans(active, ncx, ncy) };
}

/** Coarse x-face I between coarse cells I - 1 and I covers fine x-face 2I in fine rows 2J and 2J + 1. */
function coarseFacesX(fine: Stencil, ncx: number, ncy: number, scale: number): Float64Array {
  const { nx, ny, faceX } = fine;
  const out = new Float64Array((ncx + 1) * ncy);
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

/** Coarse y-face J between coarse rows J - 1 and J covers fine y-face row 2J in fine columns 2I and 2I + 1. */
function coarseFacesY(fine: Stencil, ncx: number, ncy: number, scale: number): Float64Array {
  const { nx, faceY } = fine;
  const out = new Float64Array(ncx * (ncy + 1));
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

/**
 * Marks coarse cells with at least one active child and returns, per coarse cell, the summed Dirichlet
 * coupling of its active children (fine diagonal minus fine face coefficients).
 */
function childDirichlet(fine: Stencil, activeOut: Uint8Array, ncx: number): Float64Array {
  const { nx, ny, diag, faceX, faceY, active } = fine;
  const out = new Float64Array(activeOut.length);
  for (let j = 0; j < ny; j++) {
    const rowX = j * (nx + 1);
    for (let i = 0; i < nx; i++) {
      const k = i + j * nx;
      if (active[k] !== 1) continue;
      const c = (i >> 1) + (j >> 1) * ncx;
      activeOut[c] = 1;
      const faces = faceX[rowX + i] + faceX[rowX + i + 1] + faceY[k] + faceY[k + nx];
      out[c] += Math.max(0, diag[k] - faces);
    }
  }
  return out;
}
