/** Traces one closed outline (edges flattened, corners filleted) into a ring that remembers which edge made each segment. */

import type { Outline, Point } from '../document/types.ts';
import { cumulativeLengths, slicePolyline, pointAtLength } from './arc-length.ts';
import { GeometryError, formatLength, outlineLabel } from './errors.ts';
import { cornerFillet, filletPoints, largestFilletRadius, type CornerFillet } from './fillet.ts';
import { flattenEdge, type FlatEdge } from './flatten-edge.ts';
import { checkOutlineShape } from './outline-checks.ts';

/** A traced outline, in the outline's own direction (not yet oriented). */
export interface TracedRing {
  /** x0, y0, x1, y1, ... length units; closed (segment k runs from point k to point (k + 1) mod n). */
  readonly xy: Float64Array;
  /** Per segment: index of the document edge it belongs to (a fillet's first half belongs to the edge before the corner). */
  readonly edgeOf: Int32Array;
}

export interface TraceOptions {
  /** Chordal tolerance, length units. */
  readonly tol: number;
  /** Absent for the section outline. */
  readonly islandName?: string;
  /** Units label for messages, e.g. "mm". */
  readonly units?: string;
}

/** Traces `outline`; throws GeometryError ('bad-outline', 'zero-length', 'bad-arc', 'fillet-too-large'). */
export function traceOutline(outline: Outline, opts: TraceOptions): TracedRing {
  checkOutlineShape(outline, opts.tol, opts.islandName);
  const { vertices, edges } = outline;
  const n = vertices.length;
  const flat: FlatEdge[] = edges.map((edge, i) =>
    flattenEdge(vertices[i].at, edge, vertices[(i + 1) % n].at, opts.tol, { edgeIndex: i, islandName: opts.islandName }));
  const cum = flat.map((f) => cumulativeLengths(f.xy));
  const lengths = cum.map((c) => c[c.length - 1]);
  const fillets = vertices.map((_, i) => filletAt(outline, i, flat, lengths, opts));

  const merge = 1e-6 * opts.tol;
  const pts: number[] = [], owner: number[] = [];
  const push = (x: number, y: number, edge: number): void => {
    const last = pts.length - 2;
    if (last >= 0 && Math.abs(pts[last] - x) <= merge && Math.abs(pts[last + 1] - y) <= merge) {
      owner[owner.length - 1] = edge; // the merged point now starts this edge's segment
      return;
    }
    pts.push(x, y);
    owner.push(edge);
  };
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const trimStart = fillets[i]?.tangentDistance ?? 0;
    const trimEnd = fillets[j]?.tangentDistance ?? 0;
    const part = slicePolyline(flat[i].xy, trimStart, Math.max(trimStart, lengths[i] - trimEnd), cum[i]);
    for (let k = 0; k + 2 < part.length; k += 2) push(part[k], part[k + 1], i);
    const fillet = fillets[j];
    if (fillet === null) continue;
    const out = pointAtLength(flat[j].xy, fillet.tangentDistance, false, cum[j]);
    const arc = filletPoints({ ...fillet, tangentIn: [part[part.length - 2], part[part.length - 1]], tangentOut: [out.x, out.y] }, opts.tol);
    // Points 0..2m of the arc; its last point starts the next edge, so push 0..2m-1, halves to edges i and j.
    const m = ((arc.length >> 1) - 1) / 2;
    for (let k = 0; k < 2 * m; k++) push(arc[2 * k], arc[2 * k + 1], k < m ? i : j);
  }
  // Drop a closing point that repeats the first.
  const last = pts.length - 2;
  if (last > 0 && Math.abs(pts[last] - pts[0]) <= merge && Math.abs(pts[last + 1] - pts[1]) <= merge) {
    pts.length = last;
    owner.length -= 1;
  }
  return { xy: Float64Array.from(pts), edgeOf: Int32Array.from(owner) };
}

/** The fillet at vertex i, null if it has none (or the corner is straight); throws 'fillet-too-large' when it does not fit. */
function filletAt(outline: Outline, i: number, flat: readonly FlatEdge[], lengths: readonly number[], opts: TraceOptions): CornerFillet | null {
  const { vertices } = outline;
  const n = vertices.length;
  const radius = vertices[i].filletRadius ?? 0;
  if (!(radius > 0)) return null;
  const before = (i - 1 + n) % n, after = (i + 1) % n;
  const fillet = cornerFillet(vertices[i].at, flat[before].endDir, flat[i].startDir, radius);
  if (fillet === null) return null;
  // An edge filleted at both ends lends each fillet at most half of itself.
  const share = (corner: number): number => ((vertices[corner].filletRadius ?? 0) > 0 ? 0.5 : 1);
  const room = Math.min(lengths[before] * share(before), lengths[i] * share(after));
  if (fillet.tangentDistance > room * (1 + 1e-9)) throw filletTooLarge(i, vertices[i].at, radius, largestFilletRadius(fillet.cornerAngle, room), opts);
  return fillet;
}

function filletTooLarge(vertexIndex: number, at: Point, radius: number, largest: number, opts: TraceOptions): GeometryError {
  const where = opts.islandName === undefined ? '' : ` of ${outlineLabel(opts.islandName)}`;
  return new GeometryError('fillet-too-large',
    `The fillet at corner ${vertexIndex + 1}${where} (radius ${formatLength(radius, opts.units)}) does not fit: ` +
    `at most ${formatLength(largest, opts.units, 'down')} fits between its neighbouring edges.`,
    { where: at, vertexIndex, islandName: opts.islandName, radius, largestRadius: largest });
}
