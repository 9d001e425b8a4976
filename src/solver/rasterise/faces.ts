/** Exact open fraction of every cell face, from where each grid line passes through the fluid. */
import { clamp, tidyFraction } from './area.ts';
import type { GridRing } from './frame.ts';

/**
 * Tie rule: a point lying on grid line u = k counts as right of it, and on v = m as above it.
 * A segment crosses line k when exactly one of its ends is left of k, so a vertex on the line is
 * counted once (or twice with opposite signs when the boundary only touches the line), and the
 * winding read along the line is the one just left of (below) it. Walls lying exactly on a line are
 * then closed by `closeWallsOnLines`.
 */

/** Open fractions: openX (nx + 1) * ny, index k + j * (nx + 1); openY nx * (ny + 1), index i + m * nx. */
export interface FaceFractions {
  readonly openX: Float64Array;
  readonly openY: Float64Array;
}

/** Open fractions of every face; `fraction` is the cells' fluid fraction (row-major), used to close faces beside solid cells. */
export function faceFractions(rings: readonly GridRing[], fraction: Float64Array, nx: number, ny: number): FaceFractions {
  const openX = new Float64Array((nx + 1) * ny);
  const openY = new Float64Array(nx * (ny + 1));
  const strideX = nx + 1;
  // A crossing at height v on line k opens (sign +1) or closes (-1) the line from v upward; stored as differences.
  const addX = (k: number, v: number, sign: number): void => {
    const j = clamp(Math.floor(v), 0, ny - 1);
    const f = v - j;
    openX[k + j * strideX] += sign * (1 - f);
    if (j + 1 < ny) openX[k + (j + 1) * strideX] += sign * f;
  };
  const addY = (m: number, u: number, sign: number): void => {
    const i = clamp(Math.floor(u), 0, nx - 1);
    const f = u - i;
    openY[i + m * nx] += sign * (1 - f);
    if (i + 1 < nx) openY[i + 1 + m * nx] += sign * f;
  };
  for (const { uv, sense } of rings) {
    forEachSegment(uv, (u0, v0, u1, v1) => {
      crossings(u0, v0, u1, v1, (k, v) => addX(k, v, Math.sign(u1 - u0) * sense));
      crossings(v0, u0, v1, u1, (m, u) => addY(m, u, -Math.sign(v1 - v0) * sense));
    });
  }
  closeWallsOnLines(rings, addX, addY);
  sumUpLines(openX, openY, fraction, nx, ny);
  return { openX, openY };
}

/**
 * Turns the stored differences into open fractions: running sums up each u-line and along each v-line, tidied.
 * A face beside a cell with no fluid is closed: only slivers below rounding level (a cell whose area
 * rounded to 0 while the line still grazes the fluid) are affected, and they carry no flow.
 */
function sumUpLines(openX: Float64Array, openY: Float64Array, fraction: Float64Array, nx: number, ny: number): void {
  const tidy = tidyFraction;
  const strideX = nx + 1;
  const running = new Float64Array(strideX);
  for (let j = 0; j < ny; j++) {
    const row = j * nx;
    for (let k = 0, f = j * strideX; k < strideX; k++, f++) {
      running[k] += openX[f];
      const between = k > 0 && k < nx && fraction[row + k - 1] > 0 && fraction[row + k] > 0;
      openX[f] = between ? tidy(running[k]) : 0;
    }
  }
  for (let m = 0; m <= ny; m++) {
    let along = 0;
    for (let i = 0, f = m * nx; i < nx; i++, f++) {
      along += openY[f];
      const between = m > 0 && m < ny && fraction[f - nx] > 0 && fraction[f] > 0;
      openY[f] = between ? tidy(along) : 0;
    }
  }
}

type SegmentVisitor = (u0: number, v0: number, u1: number, v1: number) => void;

function forEachSegment(uv: Float64Array, visit: SegmentVisitor): void {
  const n = uv.length >> 1;
  for (let k = 0; k < n; k++) {
    const m = k + 1 === n ? 0 : k + 1;
    visit(uv[2 * k], uv[2 * k + 1], uv[2 * m], uv[2 * m + 1]);
  }
}

/**
 * Calls back (k, t) for each integer line a = k the segment crosses under the tie rule,
 * t being the other coordinate there. Written for u-lines; swap the arguments for v-lines.
 */
function crossings(a0: number, b0: number, a1: number, b1: number, hit: (k: number, t: number) => void): void {
  if (a0 === a1) return;
  const lo = Math.floor(Math.min(a0, a1)) + 1;
  const hi = Math.floor(Math.max(a0, a1));
  const slope = (b1 - b0) / (a1 - a0);
  for (let k = lo; k <= hi; k++) {
    hit(k, k === a1 ? b1 : k === a0 ? b0 : b0 + (k - a0) * slope);
  }
}

/**
 * A wall lying exactly on a grid line separates the cells on either side, but the winding just
 * left of (below) the line still reads fluid when the fluid is on that side. Such stretches are
 * taken off the open length. Only segments with the fluid on the left (below) are looked at,
 * so a zero-thickness baffle, made of two coincident segments, is taken off once; a zero-width slit
 * (fluid on neither side) reads no fluid and is left alone.
 */
function closeWallsOnLines(
  rings: readonly GridRing[],
  addX: (k: number, v: number, sign: number) => void,
  addY: (m: number, u: number, sign: number) => void,
): void {
  for (const { uv, sense } of rings) {
    forEachSegment(uv, (u0, v0, u1, v1) => {
      if (u0 === u1 && Number.isInteger(u0) && sense * (v1 - v0) > 0) {
        if (windingAlongLine(rings, false, u0, 0.5 * (v0 + v1)) >= 1) {
          addX(u0, Math.min(v0, v1), -1);
          addX(u0, Math.max(v0, v1), 1);
        }
      }
      if (v0 === v1 && Number.isInteger(v0) && sense * (u1 - u0) < 0) {
        if (windingAlongLine(rings, true, v0, 0.5 * (u0 + u1)) >= 1) {
          addY(v0, Math.min(u0, u1), -1);
          addY(v0, Math.max(u0, u1), 1);
        }
      }
    });
  }
}

/** Winding number on grid line k (u = k, or v = k when `alongU`) at position t along it, by the tie rule. */
function windingAlongLine(rings: readonly GridRing[], alongU: boolean, k: number, t: number): number {
  let winding = 0;
  for (const { uv, sense } of rings) {
    forEachSegment(uv, (u0, v0, u1, v1) => {
      const [a0, b0, a1, b1] = alongU ? [v0, u0, v1, u1] : [u0, v0, u1, v1];
      if (a0 < k === a1 < k) return;
      const b = b0 + ((k - a0) * (b1 - b0)) / (a1 - a0);
      if (b < t) winding += (alongU ? -1 : 1) * Math.sign(a1 - a0) * sense;
    });
  }
  return winding;
}
