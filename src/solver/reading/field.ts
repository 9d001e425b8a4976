/** The cell potential carried a little way into the solid, and sampled anywhere by bilinear interpolation. */
import type { GridFrame } from '../rasterise/frame.ts';
import type { CutGrid } from '../types.ts';

/**
 * A copy of `phi` (row-major i + j * nx, NaN where not solved) with `layers` rings of cells outside the solved
 * region filled, each with the mean of its already-filled edge neighbours. The copy lets equipotential lines and
 * interpolation run up to (and past) a wall, where they are clipped; the mean of the neighbours is a zero normal
 * gradient, which is what a wall imposes, so an equipotential reaches the wall square-on as it should.
 * Only the ring being filled is visited: one scan finds the first, each next one is the unfilled neighbours of the last.
 */
export function extendedPhi(grid: Pick<CutGrid, 'nx' | 'ny'>, phi: Float64Array, layers = 2): Float64Array {
  const { nx, ny } = grid;
  const out = phi.slice();
  let ring = firstRing(out, nx, ny);
  const queued = new Uint8Array(layers > 1 ? out.length : 0);
  for (let layer = 0; layer < layers && ring.length > 0; layer++) {
    // every value of a ring comes from the cells filled before it, so all are found before any is written
    const values = new Float64Array(ring.length);
    for (let q = 0; q < ring.length; q++) values[q] = filledNeighbourMean(out, nx, ny, ring[q]);
    for (let q = 0; q < ring.length; q++) out[ring[q]] = values[q];
    if (layer + 1 < layers) ring = nextRing(out, nx, ny, ring, queued);
  }
  return out;
}

/** Unfilled cells with a filled edge neighbour, in row-major order. */
function firstRing(values: Float64Array, nx: number, ny: number): Int32Array {
  const ring: number[] = [];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = i + j * nx;
      if (Number.isFinite(values[c])) continue;
      if ((i > 0 && Number.isFinite(values[c - 1])) || (i < nx - 1 && Number.isFinite(values[c + 1])) ||
        (j > 0 && Number.isFinite(values[c - nx])) || (j < ny - 1 && Number.isFinite(values[c + nx]))) ring.push(c);
    }
  }
  return Int32Array.from(ring);
}

/** Unfilled edge neighbours of the ring just filled, each once; `queued` marks cells already taken (one per cell). */
function nextRing(values: Float64Array, nx: number, ny: number, ring: Int32Array, queued: Uint8Array): Int32Array {
  const next: number[] = [];
  const take = (c: number): void => {
    if (queued[c] || Number.isFinite(values[c])) return;
    queued[c] = 1;
    next.push(c);
  };
  for (let q = 0; q < ring.length; q++) {
    const c = ring[q];
    const i = c % nx, j = (c - i) / nx;
    if (i > 0) take(c - 1);
    if (i < nx - 1) take(c + 1);
    if (j > 0) take(c - nx);
    if (j < ny - 1) take(c + nx);
  }
  return Int32Array.from(next);
}

/** Mean of the filled edge neighbours of cell c (left, right, below, above, summed in that order). */
function filledNeighbourMean(values: Float64Array, nx: number, ny: number, c: number): number {
  const i = c % nx, j = (c - i) / nx;
  let sum = 0;
  let count = 0;
  if (i > 0 && Number.isFinite(values[c - 1])) { sum += values[c - 1]; count++; }
  if (i < nx - 1 && Number.isFinite(values[c + 1])) { sum += values[c + 1]; count++; }
  if (j > 0 && Number.isFinite(values[c - nx])) { sum += values[c - nx]; count++; }
  if (j < ny - 1 && Number.isFinite(values[c + nx])) { sum += values[c + nx]; count++; }
  return sum / count;
}

/**
 * Bilinear interpolation of a cell-centred field at (x, y), document units. Corners that are NaN drop out and the
 * remaining weights are rescaled; NaN when all four are NaN or the point is off the grid. Only the lattice is read
 * (not the cut-cell fractions), so any cell-centred field on a grid can be sampled (a warm start's old potential too).
 * @param values row-major i + j * nx, cell centres at (x0 + (i + 0.5) h, y0 + (j + 0.5) h)
 */
export function sampleCells(grid: GridFrame, values: Float64Array, x: number, y: number): number {
  const { nx, ny, h } = grid;
  const u = (x - grid.x0) / h - 0.5;
  const v = (y - grid.y0) / h - 0.5;
  const i = Math.floor(u);
  const j = Math.floor(v);
  if (!(i >= -1 && j >= -1 && i < nx && j < ny)) return NaN;
  const fu = u - i;
  const fv = v - j;
  let sum = 0;
  let weight = 0;
  for (let b = 0; b <= 1; b++) {
    for (let a = 0; a <= 1; a++) {
      const ci = i + a;
      const cj = j + b;
      if (ci < 0 || cj < 0 || ci >= nx || cj >= ny) continue;
      const value = values[ci + cj * nx];
      if (!Number.isFinite(value)) continue;
      const w = (a === 1 ? fu : 1 - fu) * (b === 1 ? fv : 1 - fv);
      sum += w * value;
      weight += w;
    }
  }
  return weight > 1e-12 ? sum / weight : NaN;
}
