/** Dirichlet coupling of cells to the inlet (phi = 1) and outlet (phi = 0) pieces that cross them. */
import { forEachCellPiece } from './clip-pieces.ts';
import { clamp } from './area.ts';
import type { GridRing } from './frame.ts';
import { MARK_INLET, MARK_OUTLET } from '../types.ts';
import type { GridDepthAt } from '../depth/face-conductance.ts';

/**
 * Smallest normal distance from a cell centre to a boundary piece used in the coupling, grid units.
 * A cut cell whose centre sits almost on (or behind) the inlet line would otherwise get a huge or
 * negative conductance Lb / dn and stiffen the system; clamping at a quarter cell caps the coupling
 * of a piece at 4 Lb / h and only touches cells whose centre is within h / 4 of the boundary,
 * where the potential differs from the boundary value by less than a quarter cell's drop anyway.
 */
const MIN_NORMAL_DISTANCE = 0.25;

/** How far a piece's midpoint is moved into the fluid to pick its cell when it lies on a grid line, grid units. */
const NUDGE = 1e-9;

export interface Couplings {
  /** Conductance to phi = 1 per cell (boundary length / normal distance, dimensionless), row-major i + j * nx. */
  readonly inletCoupling: Float64Array;
  /** Conductance to phi = 0 per cell, same layout. */
  readonly outletCoupling: Float64Array;
  /** Every cell given a coupling (i + j * nx), in no order, with repeats. */
  readonly touched: readonly number[];
}

/**
 * For each inlet or outlet piece inside a cell, adds Lb / max(dn, h / 4), dn being the distance from the
 * cell centre to the piece's line along the inward normal. The flux Lb (phi_b - phi_c) / dn is exact
 * for a potential that varies linearly across the boundary, so a straight channel whose inlet and
 * outlet lie on grid lines (dn = h / 2) gets the exact linear solution.
 * `fraction` is the cells' fluid fraction (row-major i + j * nx): cells without fluid get no coupling.
 * With a passage depth each piece's coupling is multiplied by the depth at its midpoint (none: unit depth).
 */
export function couplings(
  rings: readonly GridRing[], fraction: Float64Array, nx: number, ny: number, depth: GridDepthAt | null = null,
): Couplings {
  const inletCoupling = new Float64Array(nx * ny);
  const outletCoupling = new Float64Array(nx * ny);
  const touched: number[] = [];
  for (const { uv, ring, sense } of rings) {
    const n = uv.length >> 1;
    for (let k = 0; k < n; k++) {
      const mark = ring.marks[k];
      if (mark !== MARK_INLET && mark !== MARK_OUTLET) continue;
      const m = k + 1 === n ? 0 : k + 1;
      const u0 = uv[2 * k];
      const v0 = uv[2 * k + 1];
      const length = Math.hypot(uv[2 * m] - u0, uv[2 * m + 1] - v0);
      if (length === 0) continue;
      // Inward normal: the fluid lies left of the direction of travel when sense = +1.
      const nu = (-(uv[2 * m + 1] - v0) / length) * sense;
      const nv = ((uv[2 * m] - u0) / length) * sense;
      const target = mark === MARK_INLET ? inletCoupling : outletCoupling;
      forEachCellPiece(u0, v0, uv[2 * m], uv[2 * m + 1], (ua, va, ub, vb) => {
        if (ua === ub && va === vb) return;
        const i = clamp(Math.floor(0.5 * (ua + ub) + NUDGE * nu), 0, nx - 1);
        const j = clamp(Math.floor(0.5 * (va + vb) + NUDGE * nv), 0, ny - 1);
        // A cell whose area rounded to 0 holds no fluid to couple (a sliver below rounding level).
        if (fraction[i + j * nx] === 0) return;
        target[i + j * nx] += pieceCoupling(ua, va, ub, vb, nu, nv, i, j, depth);
        touched.push(i + j * nx);
      });
    }
  }
  return { inletCoupling, outletCoupling, touched };
}

/**
 * Coupling Lb / max(dn, h / 4) of one inlet or outlet piece (ua, va) -> (ub, vb) to cell (i, j), grid units;
 * (nu, nv) is the unit normal pointing into the fluid; times the depth at the piece's midpoint when `depth` is given.
 */
export function pieceCoupling(
  ua: number, va: number, ub: number, vb: number, nu: number, nv: number, i: number, j: number, depth: GridDepthAt | null = null,
): number {
  const dn = (i + 0.5 - 0.5 * (ua + ub)) * nu + (j + 0.5 - 0.5 * (va + vb)) * nv;
  const coupling = Math.hypot(ub - ua, vb - va) / Math.max(dn, MIN_NORMAL_DISTANCE);
  return depth === null ? coupling : coupling * depth(0.5 * (ua + ub), 0.5 * (va + vb));
}
