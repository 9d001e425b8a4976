/** Clips a flow domain's rings to the half-plane on one side of a line (a round section's kept side of its axis). */

import { MARK_WALL, type Ring } from '../solver/types.ts';
import { signedArea } from './area.ts';

/** The kept half-plane: points p with (p - point) . normal > 0. `normal` any length but zero. */
export interface HalfPlane {
  readonly x: number;
  readonly y: number;
  readonly normalX: number;
  readonly normalY: number;
}

/** The clipped region: every ring that bounds fluid on the kept side (outer ones counter-clockwise, holes clockwise). */
export interface ClippedRings {
  readonly outers: readonly Ring[];
  readonly holes: readonly Ring[];
}

/** A run of a ring inside the half-plane, from where it comes in over the line to where it leaves (fluid on its left). */
interface Chain {
  readonly xy: number[];
  /** Per segment: mark and wall id of the ring segment it is part of. */
  readonly marks: number[];
  readonly wallIds: number[];
  /** Place of the first and last point along the line (the direction with the kept side on its left). */
  readonly entryAt: number;
  readonly exitAt: number;
}

/**
 * The region inside `outer` and outside `islands` (outer counter-clockwise, islands clockwise, so the fluid lies left
 * of every ring), cut by the line of `plane` and kept on its positive side. Every segment keeps its mark and wall id;
 * the new segments along the line are walls (mark MARK_WALL) with wall id `lineWallId` (unnamed, -1, by default). A line of symmetry carries no flux, and
 * with the round depth b = 2 pi r, which is zero on the axis, a wall there is what the solver makes of it anyway.
 * A ring wholly on the kept side stays as it is, one wholly on the other side is dropped, and a ring the line cuts
 * joins the pieces the line gives: a valve head cut in half by its axis becomes part of the outer boundary, which then
 * runs along the axis, round the half valve and on along the axis. Points on the line count as outside.
 * Example: the square (-1, -1) .. (1, 1) kept above y = 0 is the rectangle (-1, 0) .. (1, 1), its lower side a wall.
 */
export function clipToHalfPlane(outer: Ring, islands: readonly Ring[], plane: HalfPlane, lineWallId = -1): ClippedRings {
  const length = Math.hypot(plane.normalX, plane.normalY);
  const nx = plane.normalX / length, ny = plane.normalY / length;
  const side = (x: number, y: number) => (x - plane.x) * nx + (y - plane.y) * ny;
  // Along the line with the kept side on the left: the normal turned a quarter turn clockwise.
  const along = (x: number, y: number) => (x - plane.x) * ny - (y - plane.y) * nx;
  const rings: Ring[] = [];
  const chains: Chain[] = [];
  for (const ring of [outer, ...islands]) {
    const cut = cutRing(ring, side, along);
    if (cut === 'inside') rings.push(ring);
    else chains.push(...cut);
  }
  rings.push(...joinChains(chains, lineWallId));
  return {
    outers: rings.filter((r) => signedArea(r.xy) > 0),
    holes: rings.filter((r) => signedArea(r.xy) < 0),
  };
}

/** The runs of `ring` inside the half-plane, or 'inside' when the whole ring is. */
function cutRing(ring: Ring, side: (x: number, y: number) => number, along: (x: number, y: number) => number): Chain[] | 'inside' {
  const n = ring.xy.length >> 1;
  const d = Array.from({ length: n }, (_, k) => side(ring.xy[2 * k], ring.xy[2 * k + 1]));
  const start = d.findIndex((v, k) => !(v > 0) && d[(k + 1) % n] > 0);
  if (start < 0) return d.every((v) => v > 0) ? 'inside' : [];
  const chains: Chain[] = [];
  let chain: { xy: number[]; marks: number[]; wallIds: number[] } | null = null;
  for (let step = 0; step < n; step++) {
    const k = (start + step) % n, m = (k + 1) % n;
    const ax = ring.xy[2 * k], ay = ring.xy[2 * k + 1], bx = ring.xy[2 * m], by = ring.xy[2 * m + 1];
    const inA = d[k] > 0, inB = d[m] > 0;
    if (!inA && !inB) continue;
    const t = inA === inB ? 0 : d[k] / (d[k] - d[m]);
    const cross: [number, number] = [ax + t * (bx - ax), ay + t * (by - ay)];
    if (!inA) chain = { xy: [...cross], marks: [], wallIds: [] };
    if (chain === null) continue;
    const end = inB ? [bx, by] : cross;
    pushPoint(chain, end[0], end[1], ring.marks[k], ring.wallIds[k]);
    if (!inB) {
      const last = chain.xy.length;
      chains.push({ ...chain, entryAt: along(chain.xy[0], chain.xy[1]), exitAt: along(chain.xy[last - 2], chain.xy[last - 1]) });
      chain = null;
    }
  }
  return chains;
}

/** Appends a segment ending at (x, y), unless it would have no length. */
function pushPoint(chain: { xy: number[]; marks: number[]; wallIds: number[] }, x: number, y: number, mark: number, wallId: number): void {
  const last = chain.xy.length;
  if (chain.xy[last - 2] === x && chain.xy[last - 1] === y) return;
  chain.xy.push(x, y);
  chain.marks.push(mark);
  chain.wallIds.push(wallId);
}

/**
 * Closes the runs into rings along the line: walking the line with the kept side on the left, each place a run
 * leaves is followed by the next place one comes in (for a region, leaving and coming in alternate along the line).
 */
function joinChains(chains: readonly Chain[], lineWallId: number): Ring[] {
  const ends = chains.flatMap((c, i) => [{ at: c.exitAt, chain: i, leaving: true }, { at: c.entryAt, chain: i, leaving: false }]);
  ends.sort((p, q) => p.at - q.at || (p.leaving === q.leaving ? 0 : p.leaving ? -1 : 1));
  const next = new Map<number, number>();
  for (let k = 0; k + 1 < ends.length; k += 2) {
    if (!ends[k].leaving || ends[k + 1].leaving) throw new RangeError('clipToHalfPlane: the rings do not bound a region (leaving and coming in do not alternate along the line)');
    next.set(ends[k].chain, ends[k + 1].chain);
  }
  const rings: Ring[] = [];
  const used = new Set<number>();
  for (let first = 0; first < chains.length; first++) {
    if (used.has(first)) continue;
    const ring = { xy: [] as number[], marks: [] as number[], wallIds: [] as number[] };
    for (let c = first; !used.has(c); c = next.get(c)!) {
      used.add(c);
      const chain = chains[c];
      if (ring.xy.length === 0) ring.xy.push(chain.xy[0], chain.xy[1]);
      else pushPoint(ring, chain.xy[0], chain.xy[1], MARK_WALL, lineWallId);
      for (let s = 0; s < chain.marks.length; s++) pushPoint(ring, chain.xy[2 * s + 2], chain.xy[2 * s + 3], chain.marks[s], chain.wallIds[s]);
    }
    // The closing segment, from the last run's exit back along the line to the first run's entry.
    ring.marks.push(MARK_WALL);
    ring.wallIds.push(lineWallId);
    if (ring.xy[0] === ring.xy[ring.xy.length - 2] && ring.xy[1] === ring.xy[ring.xy.length - 1]) {
      ring.xy.length -= 2;
      ring.marks.pop();
      ring.wallIds.pop();
      // The last run ended where the first began: its last segment is the closing one.
    }
    rings.push({ xy: Float64Array.from(ring.xy), marks: Uint8Array.from(ring.marks), wallIds: Int32Array.from(ring.wallIds) });
  }
  return rings;
}
