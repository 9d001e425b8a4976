/** Arc length along polylines (x0, y0, x1, y1, ... in length units): totals, the point at a length, and slices. */

/** A point on a polyline with the unit tangent (direction of travel) there. */
export interface PolylinePoint {
  readonly x: number;
  readonly y: number;
  readonly tx: number;
  readonly ty: number;
  /** Index of the segment the point lies on (segment k runs from point k to point k + 1). */
  readonly segment: number;
}

function segmentCount(xy: Float64Array, closed: boolean): number {
  const n = xy.length >> 1;
  return closed ? n : Math.max(0, n - 1);
}

/**
 * Running arc length at each point: entry k is the length from point 0 to point k.
 * A closed polyline gets one more entry, the length back to point 0 (the perimeter).
 */
export function cumulativeLengths(xy: Float64Array, closed = false): Float64Array {
  const n = xy.length >> 1, m = segmentCount(xy, closed);
  const out = new Float64Array(m + 1);
  for (let k = 0; k < m; k++) {
    const j = (k + 1) % n;
    out[k + 1] = out[k] + Math.hypot(xy[2 * j] - xy[2 * k], xy[2 * j + 1] - xy[2 * k + 1]);
  }
  return out;
}

/** Total length of the polyline (the perimeter when closed). */
export function polylineLength(xy: Float64Array, closed = false): number {
  const cum = cumulativeLengths(xy, closed);
  return cum[cum.length - 1];
}

/**
 * The point at arc length `s` from point 0 (clamped to the polyline), with its unit tangent.
 * At a point shared by two segments (to within 1e-12 of the total length) the tangent is the mean of their directions, so a sampled
 * wall direction does not jump with where the flattening happened to put its points.
 * Pass `cumulative` (from cumulativeLengths) when sampling one polyline many times.
 */
export function pointAtLength(xy: Float64Array, s: number, closed = false, cumulative?: Float64Array): PolylinePoint {
  const cum = cumulative ?? cumulativeLengths(xy, closed);
  const m = cum.length - 1;
  if (m < 1) throw new RangeError('pointAtLength needs a polyline of at least two points');
  const total = cum[m];
  const sc = Math.min(total, Math.max(0, s));
  const k = findSegment(cum, sc);
  const [ax, ay, bx, by] = segmentEnds(xy, k);
  const len = cum[k + 1] - cum[k];
  // Within rounding of a join counts as at the join: a length computed as "half the total" must find the vertex there.
  const near = 1e-12 * total;
  const t = len > 0 ? (sc - cum[k]) / len : 0;
  let [tx, ty] = direction(ax, ay, bx, by);
  const atJoin = Math.abs(cum[k + 1] - sc) <= near ? k + 1 : Math.abs(sc - cum[k]) <= near ? k : -1;
  if (atJoin >= 0 && (closed || (atJoin > 0 && atJoin < m))) {
    const before = (atJoin - 1 + m) % m, after = atJoin % m;
    const d0 = direction(...segmentEnds(xy, before)), d1 = direction(...segmentEnds(xy, after));
    [tx, ty] = normalise(d0[0] + d1[0], d0[1] + d1[1], tx, ty);
  }
  return { x: ax + t * (bx - ax), y: ay + t * (by - ay), tx, ty, segment: k };
}

/** Segment index k with cum[k] <= s <= cum[k + 1] (binary search; the last segment for s = total). */
function findSegment(cum: Float64Array, s: number): number {
  let lo = 0, hi = cum.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (cum[mid] <= s) lo = mid; else hi = mid - 1;
  }
  return lo;
}

function segmentEnds(xy: Float64Array, k: number): [number, number, number, number] {
  const n = xy.length >> 1, j = (k + 1) % n;
  return [xy[2 * k], xy[2 * k + 1], xy[2 * j], xy[2 * j + 1]];
}

function direction(ax: number, ay: number, bx: number, by: number): [number, number] {
  return normalise(bx - ax, by - ay, 0, 0);
}

function normalise(x: number, y: number, fallbackX: number, fallbackY: number): [number, number] {
  const len = Math.hypot(x, y);
  return len > 0 ? [x / len, y / len] : [fallbackX, fallbackY];
}

/**
 * The part of an open polyline between arc lengths s0 and s1 (0 <= s0 <= s1 <= total), both cut points included.
 * Used to trim an edge back to a fillet's tangent points.
 */
export function slicePolyline(xy: Float64Array, s0: number, s1: number, cumulative?: Float64Array): Float64Array {
  const cum = cumulative ?? cumulativeLengths(xy, false);
  const a = pointAtLength(xy, s0, false, cum), b = pointAtLength(xy, s1, false, cum);
  const out: number[] = [a.x, a.y];
  // Whole points strictly between the two cuts.
  for (let k = a.segment + 1; k <= b.segment; k++) {
    if (cum[k] > s0 && cum[k] < s1) out.push(xy[2 * k], xy[2 * k + 1]);
  }
  out.push(b.x, b.y);
  return Float64Array.from(out);
}
