/** Sparse list of the cells tied to a fixed potential (inlet / outlet), by row, for the stencil's diagonal. */

/**
 * Cells with a Dirichlet coupling, in ascending index order. A cell's diagonal is its face sum plus its
 * coupling here; keeping the couplings sparse (they sit only along the inlet and outlet) spares the solver
 * a dense diagonal array (8 bytes a cell) and the memory traffic of reading it in every pass.
 */
export interface DirichletList {
  /** Cell index i + j * nx, ascending. */
  readonly cells: Int32Array;
  /** Coupling conductance of each listed cell (dimensionless), > 0. */
  readonly coupling: Float64Array;
  /** Cells of row j are entries rowPtr[j] .. rowPtr[j + 1] - 1; length ny + 1. */
  readonly rowPtr: Int32Array;
}

/** Builds the list from (cell, coupling) pairs with positive coupling; pairs need not be sorted. */
export function dirichletList(cells: readonly number[], coupling: readonly number[], nx: number, ny: number): DirichletList {
  const order = cells.map((_, m) => m).sort((a, b) => cells[a] - cells[b]);
  const sortedCells = Int32Array.from(order, (m) => cells[m]);
  const sortedCoupling = Float64Array.from(order, (m) => coupling[m]);
  const rowPtr = new Int32Array(ny + 1);
  for (const k of sortedCells) rowPtr[Math.floor(k / nx) + 1]++;
  for (let j = 0; j < ny; j++) rowPtr[j + 1] += rowPtr[j];
  return { cells: sortedCells, coupling: sortedCoupling, rowPtr };
}

/** Coupling of cell k, 0 if it has none (binary search; for set-up code, not hot loops). */
export function couplingOf(list: DirichletList, k: number): number {
  let lo = 0;
  let hi = list.cells.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const c = list.cells[mid];
    if (c === k) return list.coupling[mid];
    if (c < k) lo = mid + 1;
    else hi = mid - 1;
  }
  return 0;
}
