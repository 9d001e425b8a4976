/** Finite-volume assembly of div(b grad phi) = 0 (b the passage depth, 1 without one) on a cut-cell grid as a symmetric 5-point stencil. */
import { dirichletList, type DirichletList } from './assemble-dirichlet.ts';
import type { CutGrid } from './types.ts';

/**
 * Added to a face sum before dividing by it, so that excluded cells (no open face, no coupling, zero
 * right-hand side) relax to 0 / TINY = 0 instead of 0 / 0. It is far below half an ulp of any real
 * diagonal, so it changes no active cell's value.
 */
export const TINY = 1e-300;

/**
 * One grid level's 5-point operator, symmetric positive definite on the active cells:
 *   (A x)_k = diag_k x_k - sum over the four faces f of cell k of coef_f x_(cell across f),
 *   diag_k = sum of the four face coefficients + Dirichlet coupling of k (from the sparse list).
 * Face coefficients are conductances (open face length / centre distance, dimensionless in 2D, times the depth
 * when there is one); on the finest level that is the face's open fraction (CutGrid.conductanceX/Y with a
 * depth). Excluded cells have no open face and no coupling, so their rows are zero and every vector the solver
 * makes stays 0 there.
 */
export interface Stencil {
  readonly nx: number;
  readonly ny: number;
  /** Inlet and outlet couplings of the active cells (the rest of the diagonal is the face sum). */
  readonly dirichlet: DirichletList;
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
  /**
   * With a passage depth: the open-length-weighted mean depth of the finest level's open faces (length units).
   * Multigrid interpolation strengths are measured against a whole face of this depth, so the preconditioner does
   * not change with the depth's units. Absent: unit depth.
   */
  readonly depthScale?: number;
}

/** Row spans of the active cells (see Stencil.rowStart). */
export function rowSpans(active: Uint8Array, nx: number, ny: number): { rowStart: Int32Array; rowEnd: Int32Array } {
  const rowStart = new Int32Array(ny);
  const rowEnd = new Int32Array(ny);
  for (let j = 0; j < ny; j++) {
    const row = active.subarray(j * nx, (j + 1) * nx);
    const first = row.indexOf(1);
    if (first >= 0) {
      rowStart[j] = first;
      rowEnd[j] = row.lastIndexOf(1) + 1;
    }
  }
  return { rowStart, rowEnd };
}

/**
 * Builds the finest-level stencil. Walls carry no flux (closed face fraction), inlet and outlet
 * couplings go to the sparse Dirichlet list (their potentials to the right-hand side, see `writeRhs`).
 * The grid's face arrays are used as they are when they already satisfy the Stencil rules (the usual
 * case: the grid edge is closed and excluded cells are sealed off); otherwise masked copies are made.
 * @param mask 1 = cell connected to inlet and outlet, i + j * nx (from connectedCells).
 */
export function assemble(grid: CutGrid, mask: Uint8Array): Stencil {
  const { nx, ny } = grid;
  if (mask.length !== nx * ny) throw new Error(`assemble: mask has ${mask.length} cells, grid ${nx * ny}`);
  const faces = { nx, ny, openX: grid.conductanceX ?? grid.openX, openY: grid.conductanceY ?? grid.openY };
  const clean = facesSealed(faces, mask);
  const faceX = clean ? faces.openX : maskedFacesX(faces, mask);
  const faceY = clean ? faces.openY : maskedFacesY(faces, mask);
  const cells: number[] = [];
  const coupling: number[] = [];
  const { inletCoupling, outletCoupling } = grid;
  const consider = (k: number) => {
    const c = inletCoupling[k] + outletCoupling[k];
    if (c > 0 && mask[k] === 1) {
      cells.push(k);
      coupling.push(c);
    }
  };
  if (grid.coupledCells) grid.coupledCells.forEach(consider);
  else for (let k = 0; k < nx * ny; k++) consider(k);
  const stencil = { nx, ny, dirichlet: dirichletList(cells, coupling, nx, ny), faceX, faceY, active: mask, ...rowSpans(mask, nx, ny) };
  return grid.conductanceX ? { ...stencil, depthScale: meanFaceDepth(grid) } : stencil;
}

/** Sum of conductances over sum of open fractions of every face: the mean depth along the open faces, length units. */
function meanFaceDepth(grid: CutGrid): number {
  let conductance = 0;
  let open = 0;
  const pairs: [Float64Array, Float64Array | undefined][] = [[grid.openX, grid.conductanceX], [grid.openY, grid.conductanceY]];
  for (const [fractions, conductances] of pairs) {
    if (!conductances) continue;
    for (let f = 0; f < fractions.length; f++) {
      open += fractions[f];
      conductance += conductances[f];
    }
  }
  return open > 0 && conductance > 0 ? conductance / open : 1;
}

/** Diagonal of cell k (face sum plus coupling); for set-up code, not hot loops. */
export function diagonalOf(s: Stencil, k: number, coupling: number): number {
  const j = Math.floor(k / s.nx);
  return s.faceX[k + j] + s.faceX[k + j + 1] + s.faceY[k] + s.faceY[k + s.nx] + coupling;
}

/**
 * Writes the right-hand side b (inlet coupling times phi = 1; the outlet's phi = 0 adds nothing),
 * 0 in excluded cells. Returns ||b||_2.
 * @param b output, i + j * nx.
 */
export function writeRhs(grid: CutGrid, mask: Uint8Array, b: Float64Array): number {
  const inlet = grid.inletCoupling;
  let sum = 0;
  if (grid.coupledCells) {
    b.fill(0);
    for (const k of grid.coupledCells) {
      const v = mask[k] === 1 ? inlet[k] : 0;
      b[k] = v;
      sum += v * v;
    }
    return Math.sqrt(sum);
  }
  for (let k = 0; k < b.length; k++) {
    const v = mask[k] === 1 ? inlet[k] : 0;
    b[k] = v;
    sum += v * v;
  }
  return Math.sqrt(sum);
}

/** A grid's faces: its open fractions, or its conductances when it has a depth. */
type Faces = Pick<CutGrid, 'nx' | 'ny' | 'openX' | 'openY'>;

/** True when the grid edge faces are closed and no open face joins an active cell to an excluded one. */
function facesSealed(grid: Faces, mask: Uint8Array): boolean {
  const { nx, ny, openX, openY } = grid;
  for (let j = 0; j < ny; j++) {
    const rowX = j * (nx + 1);
    const rowK = j * nx;
    if (openX[rowX] !== 0 || openX[rowX + nx] !== 0) return false; // the grid's left and right edges
    for (let i = 1; i < nx; i++) {
      if (openX[rowX + i] !== 0 && (mask[rowK + i - 1] & mask[rowK + i]) === 0) return false;
    }
  }
  for (let i = 0; i < nx; i++) if (openY[i] !== 0 || openY[ny * nx + i] !== 0) return false; // bottom and top edges
  for (let k = nx; k < ny * nx; k++) {
    if (openY[k] !== 0 && (mask[k - nx] & mask[k]) === 0) return false;
  }
  return true;
}

function maskedFacesX(grid: Faces, mask: Uint8Array): Float64Array {
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

function maskedFacesY(grid: Faces, mask: Uint8Array): Float64Array {
  const { nx, ny, openY } = grid;
  const out = new Float64Array(openY.length);
  for (let k = nx; k < nx * ny; k++) {
    if (mask[k] === 1 && mask[k - nx] === 1) out[k] = openY[k];
  }
  return out;
}
