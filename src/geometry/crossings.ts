/** Finds where closed polylines cross or touch themselves or each other (sweep over x so a drag stays cheap). */

/** A closed polyline to check. */
export interface CrossingRing {
  /** x0, y0, x1, y1, ... length units; segment k runs from point k to point (k + 1) mod n. */
  readonly xy: Float64Array;
  /** Per segment: document edge it came from (defaults to the segment index). */
  readonly edgeOf?: Int32Array;
}

/** Two segments that cross or touch; ring indices into the array given, ringA <= ringB. */
export interface Crossing {
  readonly ringA: number;
  readonly segmentA: number;
  readonly edgeA: number;
  readonly ringB: number;
  readonly segmentB: number;
  readonly edgeB: number;
  /** Crossing (or touching) point, length units. */
  readonly point: [number, number];
}

/**
 * First crossing found among all segments of all rings, or null.
 * Neighbouring segments of one ring share a point by design; they count only when they fold back
 * over each other (collinear, opposite directions). Touching counts as crossing: it pinches the passage shut.
 * Cost: O(s log s + pairs whose x-ranges overlap), for s segments in total.
 */
export function findCrossing(rings: readonly CrossingRing[]): Crossing | null {
  const segs = collectSegments(rings);
  const order = Array.from({ length: segs.count }, (_, k) => k).sort((a, b) => segs.box[4 * a] - segs.box[4 * b]);
  const active: number[] = [];
  for (const s of order) {
    const minX = segs.box[4 * s];
    let kept = 0;
    for (const a of active) if (segs.box[4 * a + 2] >= minX) active[kept++] = a;
    active.length = kept;
    for (const a of active) {
      if (segs.box[4 * a + 1] > segs.box[4 * s + 3] || segs.box[4 * s + 1] > segs.box[4 * a + 3]) continue;
      const hit = testPair(rings, segs, Math.min(a, s), Math.max(a, s));
      if (hit !== null) return hit;
    }
    active.push(s);
  }
  return null;
}

interface SegmentTable {
  readonly count: number;
  /** Per segment: ring index. */
  readonly ring: Int32Array;
  /** Per segment: index within its ring. */
  readonly index: Int32Array;
  /** Per segment: minX, minY, maxX, maxY. */
  readonly box: Float64Array;
}

function collectSegments(rings: readonly CrossingRing[]): SegmentTable {
  const count = rings.reduce((sum, r) => sum + (r.xy.length >> 1), 0);
  const ring = new Int32Array(count), index = new Int32Array(count), box = new Float64Array(4 * count);
  let s = 0;
  rings.forEach((r, ri) => {
    const n = r.xy.length >> 1;
    for (let k = 0; k < n; k++, s++) {
      const j = (k + 1) % n;
      const ax = r.xy[2 * k], ay = r.xy[2 * k + 1], bx = r.xy[2 * j], by = r.xy[2 * j + 1];
      ring[s] = ri; index[s] = k;
      box[4 * s] = Math.min(ax, bx); box[4 * s + 1] = Math.min(ay, by);
      box[4 * s + 2] = Math.max(ax, bx); box[4 * s + 3] = Math.max(ay, by);
    }
  });
  return { count, ring, index, box };
}

/** Segment ends [ax, ay, bx, by] of segment k of a ring. */
function ends(r: CrossingRing, k: number): [number, number, number, number] {
  const n = r.xy.length >> 1, j = (k + 1) % n;
  return [r.xy[2 * k], r.xy[2 * k + 1], r.xy[2 * j], r.xy[2 * j + 1]];
}

function testPair(rings: readonly CrossingRing[], segs: SegmentTable, s: number, t: number): Crossing | null {
  const ra = segs.ring[s], rb = segs.ring[t], ka = segs.index[s], kb = segs.index[t];
  const a = ends(rings[ra], ka), b = ends(rings[rb], kb);
  let point: [number, number] | null;
  if (ra === rb && areNeighbours(rings[ra].xy.length >> 1, ka, kb)) {
    point = (kb === (ka + 1) % (rings[ra].xy.length >> 1)) ? foldBack(a, b) : foldBack(b, a);
  } else {
    point = segmentIntersection(a, b);
  }
  if (point === null) return null;
  const edgeA = rings[ra].edgeOf?.[ka] ?? ka, edgeB = rings[rb].edgeOf?.[kb] ?? kb;
  return { ringA: ra, segmentA: ka, edgeA, ringB: rb, segmentB: kb, edgeB, point };
}

function areNeighbours(n: number, k: number, l: number): boolean {
  return (k + 1) % n === l || (l + 1) % n === k;
}

/** Where segment `second` (starting at the end of `first`) doubles back over `first`, or null. */
function foldBack(first: readonly number[], second: readonly number[]): [number, number] | null {
  const ux = first[2] - first[0], uy = first[3] - first[1];
  const vx = second[2] - second[0], vy = second[3] - second[1];
  const cross = ux * vy - uy * vx, dot = ux * vx + uy * vy;
  const collinear = Math.abs(cross) <= 1e-12 * Math.hypot(ux, uy) * Math.hypot(vx, vy);
  return collinear && dot < 0 ? [second[0], second[1]] : null;
}

/** Twice the signed area of triangle (a, b, c). */
function orient(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
}

/** The point where segments p and q ([ax, ay, bx, by] each) cross or touch, or null. */
export function segmentIntersection(p: readonly number[], q: readonly number[]): [number, number] | null {
  const [ax, ay, bx, by] = p, [cx, cy, dx, dy] = q;
  const d1 = orient(cx, cy, dx, dy, ax, ay), d2 = orient(cx, cy, dx, dy, bx, by);
  const d3 = orient(ax, ay, bx, by, cx, cy), d4 = orient(ax, ay, bx, by, dx, dy);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
    const t = d1 / (d1 - d2);
    return [ax + t * (bx - ax), ay + t * (by - ay)];
  }
  // Touching: an end lying exactly on the other segment (includes collinear overlaps).
  if (d1 === 0 && within(cx, cy, dx, dy, ax, ay)) return [ax, ay];
  if (d2 === 0 && within(cx, cy, dx, dy, bx, by)) return [bx, by];
  if (d3 === 0 && within(ax, ay, bx, by, cx, cy)) return [cx, cy];
  if (d4 === 0 && within(ax, ay, bx, by, dx, dy)) return [dx, dy];
  return null;
}

/** Whether point p, known to be on the line a-b, lies within the segment's box. */
function within(ax: number, ay: number, bx: number, by: number, px: number, py: number): boolean {
  return px >= Math.min(ax, bx) && px <= Math.max(ax, bx) && py >= Math.min(ay, by) && py <= Math.max(ay, by);
}
