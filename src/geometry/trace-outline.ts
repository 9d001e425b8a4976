/** Traces one closed outline (edges flattened, corners filleted) into a ring that remembers which edge made each segment. */

import type { Outline } from '../document/types.ts';
import { cumulativeLengths } from './arc-length.ts';
import { edgePath } from './edge-path.ts';
import { filletPoints } from './fillet.ts';
import { flattenPath } from './flatten-edge.ts';
import { checkOutlineShape } from './outline-checks.ts';
import { placeFillet, type OutlineEdges, type PlacedFillet } from './outline-fillets.ts';

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
  const paths = edges.map((edge, i) => edgePath(vertices[i].at, edge, vertices[(i + 1) % n].at, { edgeIndex: i, islandName: opts.islandName }));
  const flat = paths.map((p) => flattenPath(p, opts.tol));
  const prepared: OutlineEdges = { paths, flat, cum: flat.map((f) => cumulativeLengths(f.xy)) };
  const fillets = vertices.map((_, i) => placeFillet(outline, i, prepared, opts));

  const ring = new RingBuilder(1e-6 * opts.tol);
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const tStart = fillets[i]?.tOut ?? 0, tEnd = fillets[j]?.tIn ?? 1;
    // An edge used up by the fillets at both its ends shrinks to its one shared tangent point.
    const part = tEnd > tStart ? (tStart === 0 && tEnd === 1 ? flat[i].xy : paths[i].flatten(tStart, tEnd, opts.tol).xy) : Float64Array.from(paths[i].point(tStart));
    for (let k = 0; k + 2 < part.length; k += 2) ring.push(part[k], part[k + 1], i);
    const fillet = fillets[j];
    if (fillet !== null) pushFillet(ring, fillet, [part[part.length - 2], part[part.length - 1]], i, j, opts.tol);
  }
  return ring.finish();
}

/** Pushes the fillet arc from its start (snapped to the trimmed edge's end) up to, not including, its end. */
function pushFillet(ring: RingBuilder, fillet: PlacedFillet, start: [number, number], edgeIn: number, edgeOut: number, tol: number): void {
  const arc = filletPoints({ ...fillet, tangentIn: start }, tol);
  // Points 0..2m; the last starts the next edge. The halves take the roles of the edges they join.
  const m = ((arc.length >> 1) - 1) / 2;
  for (let k = 0; k < 2 * m; k++) ring.push(arc[2 * k], arc[2 * k + 1], k < m ? edgeIn : edgeOut);
}

/** Collects ring points, each tagged with the edge owning the segment that starts there; merges repeated points. */
class RingBuilder {
  private readonly pts: number[] = [];
  private readonly owner: number[] = [];
  constructor(private readonly merge: number) {}

  push(x: number, y: number, edge: number): void {
    const last = this.pts.length - 2;
    if (last >= 0 && this.same(last, x, y)) {
      this.owner[this.owner.length - 1] = edge; // the merged point now starts this edge's segment
      return;
    }
    this.pts.push(x, y);
    this.owner.push(edge);
  }

  finish(): TracedRing {
    const last = this.pts.length - 2;
    if (last > 0 && this.same(last, this.pts[0], this.pts[1])) {
      this.pts.length = last;
      this.owner.length -= 1;
    }
    return { xy: Float64Array.from(this.pts), edgeOf: Int32Array.from(this.owner) };
  }

  private same(at: number, x: number, y: number): boolean {
    return Math.abs(this.pts[at] - x) <= this.merge && Math.abs(this.pts[at + 1] - y) <= this.merge;
  }
}
