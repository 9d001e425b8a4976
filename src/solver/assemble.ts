/** Finite-volume assembly of div(grad phi) = 0 on a cut-cell grid as a symmetric 5-point stencil. */
import type { CutGrid } from './types.ts';

/**
 * One grid level's 5-point operator, symmetric positive definite on the active cells:
 *   (A x)_k = diag_k x_k - sum over the four faces f of cell k of coef_f x_(cell across f).
 * Face coefficients are conductances (open face length / centre distance, dimensionless in 2D);
 * on the finest level that is the face's open fraction. Excluded cells get diag 1 and no open face,
 * so their rows are the identity and every vector the solver makes stays 0 there.
 */
export interface Stencil {
  readonly nx: number;
  readonly ny: number;
  /** Diagonal, row-major i + j * nx: sum of the cell's face coefficients plus its Dirichlet couplings; 1 in excluded cells. */
  readonly diag: Float64Array;
  /** x-face coefficients, (nx + 1) * ny, index i + j * (nx + 1) (face between cells i - 1 and i); 0 on the grid edge and beside excluded cells. */
  readonly faceX: Float64Array;
  /** y-face coefficients, nx * (ny + 1), index i + j * nx (face between rows j - 1 and j); 0 on the grid edge and beside excluded cells. */
  readonly faceY: Float64Array;
  /** 1 = cell takes part in the solve, 0 = excluded; i + j * nx. */
  readonly active: Uint8Array;
  /**
   * Per row j: the active cells lie in columns rowStart[j] <= i < rowEnd[j] (both 0 for a row without any).
   * Kernels loop over these spans only, so the solid margin around a port costs nothing; vector entries
   * outside them are never written and stay 0.
   */
  readonly rowStart: Int32Array;
  readonly rowEnd: Int32Array;
}

/** Row spans of the active cells (see Stencil.rowStart). */
export function rowSpans(active: Uint8Array, nx: number, ny: number): { rowStart: Int32Array; rowEnd: Int32Array } {
  const rowStart = new Int32Array(ny);
  const rowEnd = new Int32Array(ny);
  for (let j = 0; j < ny; j++) {
    const row = j * nx;
    let first = -1;
    let last = -1;
    for (let i = 0; i < nx; i++) {
      if (active[row + i] !== 1) continue;
      if (first < 0) first = i;
      last = i;
    }
    if (first >= 0) {
      rowStart[j] = first;
      rowEnd[j] = last + 1;
    }
  }
  return { rowStart, rowEnd };
}

/**
 * Builds the finest-level stencil. Walls carry no flux (closed face fraction), inlet and outlet
 * couplings add to the diagonal (the Dirichlet values go to the right-hand side, see `writeRhs`).
 * The grid's face arrays are used as they are when they already satisfy the Stencil rules (the usual
 * case: the grid edge is closed and excluded cells are sealed off); otherwise masked copies are made.
 * @param mask 1 = cell connected to inlet and outlet, i + j * nx (from connectedCells).
 */
export function assemble(grid: CutGrid, mask: Uint8Array): Stencil {
  const { nx, ny } = grid;
  if (mask.length !== nx * ny) throw new Error(`assemble: mask has ${mask.length} cells, grid ${nx * ny}`);
  const clean = facesSealed(grid, mask);
  const faceX = clean ? grid.openX : maskedFacesX(grid, mask);
  const faceY = clean ? grid.openY : maskedFacesY(grid, mask);
  const diag = new Float64Array(nx * ny);
  const { inletCoupling, outletCoupling } = grid;
  for (let j = 0; j < ny; j++) {
    const rowX = j * (nx + 1);
    for (let i = 0; i < nx; i++) {
      const k = i + j * nx;
      diag[k] = mask[k] === 1
        ? faceX[rowX + i] + faceX[rowX + i + 1] + faceY[k] + faceY[k + nx] + inletCoupling[k] + outletCoupling[k]
        : 1;
    }
  }
  return { nx, ny, diag, faceX, faceY, active: mask, ...rowSpans(mask, nx, ny) };
}

/**
 * Writes the right-hand side b (inlet coupling times phi = 1; the outlet's phi = 0 adds nothing),
 * 0 in excluded cells. Returns ||b||_2.
 * @param b output, i + j * nx.
 */
export function writeRhs(grid: CutGrid, mask: Uint8Array, b: Float64Array): number {
  const inlet = grid.inletCoupling;
  let sum = 0;
  for (let k = 0; k < b.length; k++) {
    const v = mask[k] === 1 ? inlet[k] : 0;
    b[k] = v;
    sum += v * v;
  }
  return Math.sqrt(sum);
}

/** True when the grid edge faces are closed and no open face joins an active cell to an excluded one. */
function facesSealed(grid: CutGrid, mask: Uint8Array): boolean {
  const { nx, ny, openX, openY } = grid;
  for (let j = 0; j < ny; j++) {
    const rowX = j * (nx + 1);
    for (let i = 0; i <= nx; i++) {
      const west = i > 0 ? mask[i - 1 + j * nx] : 0;
      const east = i < nx ? mask[i + j * nx] : 0;
      if (openX[rowX + i] !== 0 && (west === 0 || east === 0)) return false;
    }
  }
  for (let j = 0; j <= ny; j++) {
    for (let i = 0; i < nx; i++) {
      const south = j > 0 ? mask[i + (j - 1) * nx] : 0;
      const north = j < ny ? mask[i + j * nx] : 0;
      if (openY[i + j * nx] !== 0 && (south === 0 || north === 0)) return false;
    }
  }
  return true;
}

function maskedFacesX(grid: CutGrid, mask: Uint8Array): Float64Array {
  const { nx, ny, openX } = grid;
  const out = new Float64Array(openX.length);
  for (let j = 0; j < ny; j++) {
    for (let i = 1; i < nx; i++) {
      const k = i + j * nx;
      if (mask[k] === 1 && mask[k - 1] === 1) out[i + j * (nx + 1)] = openX[i + j * (nx + 1)];
    }
  }
  return out;
}

function maskedFacesY(grid: CutGrid, mask: Uint8Array): Float64Array {
  const { nx, ny, openY } = grid;
  const out = new Float64Array(openY.length);
  for (let k = nx; k < nx * ny; k++) {
    if (mask[k] === 1 && mask[k - nx] === 1) out[k] = openY[k];
  }
  return out;
}
