/** Which boundary segments pass through each grid cell, to clip lines to the fluid and stop tracers at the boundary. */
import type { CutGrid, FlowDomain } from '../types.ts';

/** Slack in cell widths when filing segments into cells. */
const SLACK = 1e-9;

/** A boundary crossing found along a short segment. */
export interface BoundaryHit {
  /** position along the query segment, 0..1 */
  readonly t: number;
  /** ring index: 0 the outline, 1 + k island k */
  readonly ring: number;
  /** segment index within the ring */
  readonly segment: number;
  /** MARK_WALL, MARK_INLET or MARK_OUTLET */
  readonly mark: number;
}

/**
 * Boundary segments bucketed by the grid cells they pass through (every cell a segment touches, rows walked
 * exactly), so that a query about a short line near one or two cells looks at a handful of segments.
 */
export class RingIndex {
  /** per cell, offsets into `refs`; cell c owns refs[start[c] .. start[c + 1]) */
  private readonly start: Int32Array;
  /** packed (ring, segment) references: 2 numbers each */
  private readonly refs: Int32Array;
  private readonly rings: readonly { readonly xy: Float64Array; readonly marks: Uint8Array }[];
  private readonly stamp: Int32Array;
  private stampValue = 0;
  private readonly segmentBase: Int32Array;

  constructor(private readonly grid: CutGrid, domain: FlowDomain) {
    this.rings = [domain.outer, ...domain.islands];
    // (cell, ring, segment) triples, then a counting sort by cell
    const triples: number[] = [];
    this.rings.forEach((ring, r) => {
      const n = ring.marks.length;
      for (let k = 0; k < n; k++) {
        const m = (k + 1) % n;
        this.fileSegment(ring.xy[2 * k], ring.xy[2 * k + 1], ring.xy[2 * m], ring.xy[2 * m + 1], r, k, triples);
      }
    });
    const cells = grid.nx * grid.ny;
    this.start = new Int32Array(cells + 1);
    for (let t = 0; t < triples.length; t += 3) this.start[triples[t] + 1] += 2;
    for (let c = 0; c < cells; c++) this.start[c + 1] += this.start[c];
    this.refs = new Int32Array(this.start[cells]);
    const fill = this.start.slice(0, cells);
    for (let t = 0; t < triples.length; t += 3) {
      this.refs[fill[triples[t]]++] = triples[t + 1];
      this.refs[fill[triples[t]]++] = triples[t + 2];
    }
    this.segmentBase = new Int32Array(this.rings.length + 1);
    this.rings.forEach((ring, r) => (this.segmentBase[r + 1] = this.segmentBase[r] + ring.marks.length));
    this.stamp = new Int32Array(this.segmentBase[this.rings.length]);
  }

  /** True when some boundary segment passes through cell (i, j). */
  touches(i: number, j: number): boolean {
    if (i < 0 || j < 0 || i >= this.grid.nx || j >= this.grid.ny) return false;
    const c = i + j * this.grid.nx;
    return this.start[c + 1] > this.start[c];
  }

  /**
   * True when no boundary segment is filed in any cell of the bounding box of (ax, ay)-(bx, by): the segment then
   * crosses no boundary (crossings would find none) and lies wholly in fluid or wholly in solid.
   */
  clearBox(ax: number, ay: number, bx: number, by: number): boolean {
    const { nx, ny, h, x0, y0 } = this.grid;
    const i0 = Math.max(0, Math.floor((Math.min(ax, bx) - x0) / h));
    const i1 = Math.min(nx - 1, Math.floor((Math.max(ax, bx) - x0) / h));
    const j0 = Math.max(0, Math.floor((Math.min(ay, by) - y0) / h));
    const j1 = Math.min(ny - 1, Math.floor((Math.max(ay, by) - y0) / h));
    for (let j = j0; j <= j1; j++) {
      const row = j * nx;
      if (this.start[row + i1 + 1] > this.start[row + i0]) return false;
    }
    return true;
  }

  /**
   * Crossings of the segment (ax, ay)-(bx, by) with the boundary, sorted along it. Only the boundary segments
   * bucketed in the cells spanned by the query's bounding box are looked at, so keep queries a cell or two long.
   */
  crossings(ax: number, ay: number, bx: number, by: number): BoundaryHit[] {
    const { nx, ny, h, x0, y0 } = this.grid;
    const i0 = Math.max(0, Math.floor((Math.min(ax, bx) - x0) / h));
    const i1 = Math.min(nx - 1, Math.floor((Math.max(ax, bx) - x0) / h));
    const j0 = Math.max(0, Math.floor((Math.min(ay, by) - y0) / h));
    const j1 = Math.min(ny - 1, Math.floor((Math.max(ay, by) - y0) / h));
    const hits: BoundaryHit[] = [];
    this.stampValue++;
    for (let j = j0; j <= j1; j++) {
      for (let i = i0; i <= i1; i++) {
        const c = i + j * nx;
        for (let p = this.start[c]; p < this.start[c + 1]; p += 2) {
          const r = this.refs[p];
          const k = this.refs[p + 1];
          const key = this.segmentBase[r] + k;
          if (this.stamp[key] === this.stampValue) continue;
          this.stamp[key] = this.stampValue;
          const t = this.hitAlong(r, k, ax, ay, bx, by);
          if (t !== null) hits.push({ t, ring: r, segment: k, mark: this.rings[r].marks[k] });
        }
      }
    }
    return hits.sort((a, b) => a.t - b.t);
  }

  /**
   * True when (x, y) lies in the fluid: inside the outline and outside every island. A cell that no boundary
   * passes through is all fluid or all solid, so its fluid fraction answers at once; otherwise an even-odd ray
   * cast over every ring decides.
   */
  contains(x: number, y: number): boolean {
    const { nx, ny, h, x0, y0 } = this.grid;
    const i = Math.floor((x - x0) / h);
    const j = Math.floor((y - y0) / h);
    if (i < 0 || j < 0 || i >= nx || j >= ny) return false;
    if (!this.touches(i, j)) return this.grid.cellFraction[i + j * nx] > 0.5;
    let inside = false;
    for (const { xy } of this.rings) {
      const n = xy.length / 2;
      for (let k = 0, m = n - 1; k < n; m = k++) {
        const yk = xy[2 * k + 1], ym = xy[2 * m + 1];
        if (yk > y !== ym > y && x < xy[2 * m] + ((y - ym) * (xy[2 * k] - xy[2 * m])) / (yk - ym)) inside = !inside;
      }
    }
    return inside;
  }

  /** Unit normal of a boundary segment pointing into the fluid (outline counter-clockwise, islands clockwise). */
  inwardNormal(ring: number, segment: number): [number, number] {
    const { xy, marks } = this.rings[ring];
    const m = (segment + 1) % marks.length;
    const tx = xy[2 * m] - xy[2 * segment];
    const ty = xy[2 * m + 1] - xy[2 * segment + 1];
    const len = Math.hypot(tx, ty) || 1;
    return [-ty / len, tx / len];
  }

  /** Parameter t on the query where it crosses boundary segment k of ring r, or null. */
  private hitAlong(r: number, k: number, ax: number, ay: number, bx: number, by: number): number | null {
    const { xy, marks } = this.rings[r];
    const m = (k + 1) % marks.length;
    const px = xy[2 * k], py = xy[2 * k + 1];
    const qx = xy[2 * m] - px, qy = xy[2 * m + 1] - py;
    const dx = bx - ax, dy = by - ay;
    const denom = dx * qy - dy * qx;
    if (denom === 0) return null;
    const t = ((px - ax) * qy - (py - ay) * qx) / denom;
    const u = ((px - ax) * dy - (py - ay) * dx) / denom;
    // half-open on the boundary segment so a line through a shared vertex counts once
    return t >= 0 && t <= 1 && u >= 0 && u < 1 ? t : null;
  }

  /**
   * Files segment k of ring r in every cell it passes through (for each grid row it spans, the columns of its piece
   * in that row) by pushing (cell, r, k) onto `triples`.
   */
  private fileSegment(ax: number, ay: number, bx: number, by: number, r: number, k: number, triples: number[]): void {
    const { nx, ny, h, x0, y0 } = this.grid;
    const flat = by === ay;
    // a hair of slack so a segment lying on a grid line is filed in the cells on both sides
    const ja = Math.floor((Math.min(ay, by) - y0) / h - SLACK);
    const jb = Math.floor((Math.max(ay, by) - y0) / h + SLACK);
    for (let j = Math.max(0, ja); j <= Math.min(ny - 1, jb); j++) {
      const ylo = Math.max(Math.min(ay, by), y0 + j * h);
      const yhi = Math.min(Math.max(ay, by), y0 + (j + 1) * h);
      const xlo = flat ? ax : ax + ((ylo - ay) * (bx - ax)) / (by - ay);
      const xhi = flat ? ax : ax + ((yhi - ay) * (bx - ax)) / (by - ay);
      const xa = flat ? Math.min(ax, bx) : Math.min(xlo, xhi);
      const xb = flat ? Math.max(ax, bx) : Math.max(xlo, xhi);
      const i0 = Math.max(0, Math.floor((xa - x0) / h - SLACK));
      const i1 = Math.min(nx - 1, Math.floor((xb - x0) / h + SLACK));
      for (let i = i0; i <= i1; i++) triples.push(i + j * nx, r, k);
    }
  }
}
