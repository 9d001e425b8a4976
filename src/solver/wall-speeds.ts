/** Speed ratio along each named wall, reconstructed at the wall from the cell potentials, for the boundary-layer march. */
import { fluidSense } from './rasterise/checks.ts';
import { solveLeadingBlock } from './leading-block.ts';
import { MARK_WALL } from './types.ts';
import type { CutGrid, FlowDomain, Ring, WallSpeeds } from './types.ts';

/** Cells whose centre lies within this many cell sizes of a wall point enter its fit. */
const FIT_RADIUS = 2.5;
const WINDOW = Math.ceil(FIT_RADIUS) + 1;
const WINDOW_SIDE = 2 * WINDOW + 1;

/** A run of consecutive wall segments of one ring that share a wall id. */
interface WallRun {
  readonly name: string;
  readonly ring: Ring;
  /** +1 when the fluid lies left of the direction of travel. */
  readonly sense: number;
  readonly segments: readonly number[];
  /** True when the run is the whole ring (an island with one name): its first and last samples coincide. */
  readonly closed: boolean;
}

/**
 * Speed ratio along every wall: one entry per run of consecutive wall segments with the same wall id,
 * in ring order (outline first, then islands). Unnamed runs are called "wall 1", "wall 2", ...; a name
 * used by two separate runs gets " (2)", " (3)" added.
 * Samples every `spacing` length units (default the cell size), ends included: x, y, s, speed / speedScale.
 * `phi` is the cell potential (row-major i + j * nx, NaN where not solved); `speedScale` is the mean inlet
 * speed in potential units per length unit. A point with no solved cell near it (the tip of a sliver of fluid
 * narrower than a cell, a pocket the flow does not reach) has no speed and is left out, so s may jump over it;
 * a wall with no such cell anywhere has no samples.
 *
 * Reconstruction: the tangential derivative at the wall point comes from a weighted least-squares fit,
 * over the solved cells within 2.5 cells joined to the wall point through open faces (so fluid behind a
 * thin wall is never used), of the quadratic harmonic polynomials with zero normal derivative at the
 * wall: phi ~ a + b s + c (s^2 - q^2) + d s q (s along the wall, q into the fluid). Weights (1 - r^2/R^2)^2
 * times the cell's fluid fraction vary smoothly as the point moves, so the result has no jumps.
 * Then one pass of the [1, 2, 1] / 4 filter along s (ends kept) damps the cell-to-cell ripple so that
 * dU/ds is usable; it leaves straight-line trends untouched and shifts a smooth curve by only
 * (spacing^2 / 4) U'', second order like the reconstruction itself.
 */
export function wallSpeeds(
  domain: FlowDomain, grid: CutGrid, phi: Float64Array, speedScale: number, spacing: number = grid.h,
): WallSpeeds[] {
  if (!(spacing > 0)) throw new RangeError(`spacing must be positive, got ${spacing}`);
  const fitter = new WallFitter(grid, phi);
  return wallRuns(domain).map((run) => ({ name: run.name, samples: sampleRun(run, fitter, speedScale, spacing) }));
}

/** Groups each ring's wall segments into runs of one wall id; a run may wrap past the ring's first point. */
function wallRuns(domain: FlowDomain): WallRun[] {
  const runs: WallRun[] = [];
  const used = new Map<string, number>();
  let unnamed = 0;
  [domain.outer, ...domain.islands].forEach((ring, index) => {
    const n = ring.marks.length;
    const key = (k: number): number => (ring.marks[k % n] === MARK_WALL ? ring.wallIds[k % n] : -2);
    const sense = fluidSense(ring, index === 0);
    let start = 0;
    while (start < n && key(start) === key(start + n - 1)) start++;
    const closed = start === n;
    if (closed) start = 0;
    for (let k = start; k < start + n; ) {
      const id = key(k);
      const segments: number[] = [];
      while (k < start + n && key(k) === id) segments.push(k++ % n);
      if (id === -2) continue;
      let name = id >= 0 && domain.wallNames[id] ? domain.wallNames[id] : `wall ${++unnamed}`;
      const seen = (used.get(name) ?? 0) + 1;
      used.set(name, seen);
      if (seen > 1) name = `${name} (${seen})`;
      runs.push({ name, ring, sense, segments, closed });
    }
  });
  return runs;
}

function sampleRun(run: WallRun, fitter: WallFitter, speedScale: number, spacing: number): Float64Array {
  const { xy } = run.ring;
  const n = run.ring.marks.length;
  const lengths = run.segments.map((k) => {
    const m = (k + 1) % n;
    return Math.hypot(xy[2 * m] - xy[2 * k], xy[2 * m + 1] - xy[2 * k + 1]);
  });
  const total = lengths.reduce((a, b) => a + b, 0);
  const count = Math.max(1, Math.round(total / spacing));
  const out = new Float64Array(4 * (count + 1));
  let seg = 0;
  let segStart = 0;
  for (let q = 0; q <= count; q++) {
    const s = (total * q) / count;
    while (seg < lengths.length - 1 && (segStart + lengths[seg] < s || lengths[seg] === 0)) segStart += lengths[seg++];
    const k = run.segments[seg];
    const m = (k + 1) % n;
    const len = lengths[seg] || 1;
    const tx = (xy[2 * m] - xy[2 * k]) / len;
    const ty = (xy[2 * m + 1] - xy[2 * k + 1]) / len;
    const along = Math.min(Math.max(s - segStart, 0), len);
    // A closed run ends exactly where it began (summed lengths would miss it by rounding), so readers can tell it is closed.
    const end = run.closed && q === count && count > 0;
    const x = end ? out[0] : xy[2 * k] + tx * along;
    const y = end ? out[1] : xy[2 * k + 1] + ty * along;
    out[4 * q] = x;
    out[4 * q + 1] = y;
    out[4 * q + 2] = s;
    out[4 * q + 3] = Math.abs(fitter.tangentialDerivative(x, y, tx, ty, -ty * run.sense, tx * run.sense)) / speedScale;
  }
  smoothAlong(out, count + 1, run.closed);
  return withSpeed(out);
}

/** The samples (stride 4) whose speed ratio is a number; the array itself when all are. */
function withSpeed(samples: Float64Array): Float64Array {
  const keep: number[] = [];
  for (let q = 0; q < samples.length / 4; q++) if (Number.isFinite(samples[4 * q + 3])) keep.push(q);
  if (4 * keep.length === samples.length) return samples;
  const out = new Float64Array(4 * keep.length);
  keep.forEach((q, k) => out.set(samples.subarray(4 * q, 4 * q + 4), 4 * k));
  return out;
}

/** One pass of [1, 2, 1] / 4 on the ratio column (stride 4); ends kept unless closed; NaN neighbours leave a sample alone. */
function smoothAlong(samples: Float64Array, count: number, closed: boolean): void {
  const raw = new Float64Array(count);
  for (let q = 0; q < count; q++) raw[q] = samples[4 * q + 3];
  const cyc = count - 1; // a closed run repeats its first sample at the end
  for (let q = 0; q < count; q++) {
    let prev: number;
    let next: number;
    if (closed && cyc >= 2) {
      prev = raw[(q - 1 + cyc) % cyc];
      next = raw[(q + 1) % cyc];
    } else {
      if (q === 0 || q === count - 1) continue;
      prev = raw[q - 1];
      next = raw[q + 1];
    }
    const value = 0.25 * prev + 0.5 * raw[q] + 0.25 * next;
    if (Number.isFinite(value)) samples[4 * q + 3] = value;
  }
}

/** Least-squares fit of the cell potentials around a wall point (see wallSpeeds). Reuses its buffers. */
class WallFitter {
  private readonly seen = new Uint8Array(WINDOW_SIDE * WINDOW_SIDE);
  private readonly queue = new Int32Array(WINDOW_SIDE * WINDOW_SIDE);
  private readonly normal = new Float64Array(16);
  private readonly rhs = new Float64Array(4);

  constructor(private readonly grid: CutGrid, private readonly phi: Float64Array) {}

  /** d phi / ds at (x, y) along unit tangent (tx, ty), with inward unit normal (nx, ny); NaN if no solved cell is near. */
  tangentialDerivative(x: number, y: number, tx: number, ty: number, nx: number, ny: number): number {
    const { h } = this.grid;
    const start = this.startCell(x, y, tx, ty, nx, ny);
    if (start < 0) return NaN;
    this.normal.fill(0);
    this.rhs.fill(0);
    const used = this.gather(start, (c, ci, cj) => {
      const dx = this.grid.x0 + (ci + 0.5) * h - x;
      const dy = this.grid.y0 + (cj + 0.5) * h - y;
      const r2 = (dx * dx + dy * dy) / (h * h);
      if (r2 >= FIT_RADIUS * FIT_RADIUS) return false;
      const s = (dx * tx + dy * ty) / h;
      const q = (dx * nx + dy * ny) / h;
      const taper = 1 - r2 / (FIT_RADIUS * FIT_RADIUS);
      this.addRow(taper * taper * this.grid.cellFraction[c], s, s * s - q * q, s * q, this.phi[c]);
      return true;
    });
    const unknowns = used >= 6 ? 4 : used >= 2 ? 2 : 0;
    if (unknowns === 0) return NaN;
    const coef = solveLeadingBlock(this.normal, this.rhs, unknowns);
    return coef === null ? NaN : coef[1] / h;
  }

  /**
   * The solved cell holding the fluid next to (x, y): a step into the fluid, growing until one is found, also
   * slanted along the wall both ways for points at a corner; failing that, a slide along the wall (the tip of a
   * sliver of fluid narrower than a cell, where the inward step lands past the far side). Only cells whose centre
   * lies inside the fit radius count; -1 if none.
   */
  private startCell(x: number, y: number, tx: number, ty: number, nx: number, ny: number): number {
    for (const step of [1e-6, 0.5, 1]) {
      for (const slant of [0, 1, -1]) {
        const c = this.solvedCellAt(x, y, step * (nx + slant * tx), step * (ny + slant * ty));
        if (c >= 0) return c;
      }
    }
    for (const along of [0.5, -0.5, 1, -1, 1.5, -1.5, 2, -2]) {
      for (const inward of [1e-6, 0.25]) {
        const c = this.solvedCellAt(x, y, along * tx + inward * nx, along * ty + inward * ny);
        if (c >= 0) return c;
      }
    }
    return -1;
  }

  /** The solved cell holding (x, y) + h (dx, dy), if its centre lies within the fit radius of (x, y); else -1. */
  private solvedCellAt(x: number, y: number, dx: number, dy: number): number {
    const { grid } = this;
    const i = Math.floor((x + dx * grid.h - grid.x0) / grid.h);
    const j = Math.floor((y + dy * grid.h - grid.y0) / grid.h);
    if (i < 0 || j < 0 || i >= grid.nx || j >= grid.ny) return -1;
    const c = i + j * grid.nx;
    if (!(grid.cellFraction[c] > 0) || !Number.isFinite(this.phi[c])) return -1;
    const r = Math.hypot(grid.x0 + (i + 0.5) * grid.h - x, grid.y0 + (j + 0.5) * grid.h - y);
    return r < FIT_RADIUS * grid.h ? c : -1;
  }

  /** Breadth-first walk over open faces from `start`, within the window; `take` says whether a cell joins (and is walked on from). */
  private gather(start: number, take: (c: number, i: number, j: number) => boolean): number {
    const { nx, ny, openX, openY } = this.grid;
    const i0 = (start % nx) - WINDOW;
    const j0 = Math.floor(start / nx) - WINDOW;
    this.seen.fill(0);
    let head = 0;
    let tail = 0;
    const visit = (i: number, j: number): void => {
      const w = i - i0 + (j - j0) * WINDOW_SIDE;
      if (i - i0 < 0 || j - j0 < 0 || i - i0 >= WINDOW_SIDE || j - j0 >= WINDOW_SIDE || i >= nx || j >= ny || this.seen[w]) return;
      this.seen[w] = 1;
      const c = i + j * nx;
      if (Number.isFinite(this.phi[c]) && this.grid.cellFraction[c] > 0 && take(c, i, j)) this.queue[tail++] = c;
    };
    visit(start % nx, Math.floor(start / nx));
    while (head < tail) {
      const c = this.queue[head++];
      const i = c % nx;
      const j = (c - i) / nx;
      if (openX[i + j * (nx + 1)] > 0) visit(i - 1, j);
      if (openX[i + 1 + j * (nx + 1)] > 0) visit(i + 1, j);
      if (openY[c] > 0) visit(i, j - 1);
      if (openY[c + nx] > 0) visit(i, j + 1);
    }
    return tail;
  }

  /** Adds one weighted cell to the normal equations of the basis 1, s, s^2 - q^2, s q. */
  private addRow(weight: number, b1: number, b2: number, b3: number, value: number): void {
    const basis = [1, b1, b2, b3];
    for (let a = 0; a < 4; a++) {
      this.rhs[a] += weight * basis[a] * value;
      for (let b = 0; b < 4; b++) this.normal[4 * a + b] += weight * basis[a] * basis[b];
    }
  }
}
