/** The split cells said in a porter's terms: which wall is thinner than a cell, where, and how thin. */
import type { GridFrame, GridRing } from './frame.ts';
import type { SplitCell, SplitScan } from './split-cells.ts';
import type { CellChain } from './cell-chains.ts';
import { MARK_WALL, type ThinWall } from '../types.ts';

/** Name for a wall segment without a name (or an inlet or outlet piece). */
export const UNNAMED_WALL = 'unnamed wall';

/**
 * Target cells at which the grid spacing h = sqrt(boxArea / cells) (frame.ts) is at most half of `thickness`:
 * 4 boxArea / thickness^2, rounded up. `boxArea` in length units squared, `thickness` in length units;
 * Infinity for a wall of no thickness.
 */
export function cellsToResolve(boxArea: number, thickness: number): number {
  return thickness > 0 ? Math.ceil((4 * boxArea) / (thickness * thickness)) : Infinity;
}

/** Relative tolerance within which split cells count as equally thin (a straight divider of even thickness). */
const SAME_THICKNESS = 1e-6;

/**
 * One entry per wall name (in the order the rings first reach them), placed at the middle one of its thinnest split
 * cells (so an even divider is placed half way along, not at its root), with the count of split cells.
 * `wallNames` is FlowDomain.wallNames; `boxArea` the domain's bounding-box area, length units squared.
 */
export function thinWallsOf(scan: SplitScan, rings: readonly GridRing[], wallNames: readonly string[], frame: GridFrame, boxArea: number): ThinWall[] {
  const byName = new Map<string, { x: number; y: number; thickness: number }[]>();
  for (const split of scan.cells.values()) {
    const { distance, wallName } = thinnestGap(split, rings, wallNames);
    const place = { x: frame.x0 + (split.i + 0.5) * frame.h, y: frame.y0 + (split.j + 0.5) * frame.h, thickness: distance * frame.h };
    const list = byName.get(wallName);
    if (list === undefined) byName.set(wallName, [place]);
    else list.push(place);
  }
  return [...byName].map(([wallName, places]) => {
    const least = places.reduce((m, p) => Math.min(m, p.thickness), Infinity);
    const thinnest = places.filter((p) => p.thickness <= least * (1 + SAME_THICKNESS));
    const { x, y } = thinnest[thinnest.length >> 1];
    return { x, y, wallName, thickness: least, cellCount: places.length, resolvingCells: cellsToResolve(boxArea, least) };
  });
}

/** Least distance between the kept piece's chains and any dropped piece's chains (grid units), and the wall there. */
function thinnestGap(split: SplitCell, rings: readonly GridRing[], wallNames: readonly string[]): { distance: number; wallName: string } {
  let distance = Infinity;
  let wallName = UNNAMED_WALL;
  const kept = split.pieces[split.kept].chains;
  split.pieces.forEach((piece, p) => {
    if (p === split.kept) return;
    for (const a of kept) {
      for (const b of piece.chains) {
        const gap = chainGap(split.chains[a], split.chains[b]);
        if (gap.distance < distance) {
          distance = gap.distance;
          wallName = nameOf(split.chains[a], gap.pieceA, rings, wallNames) ?? nameOf(split.chains[b], gap.pieceB, rings, wallNames) ?? UNNAMED_WALL;
        }
      }
    }
  });
  return { distance, wallName };
}

/** The name of the wall piece `piece` of `chain` was cut from, or null when it has none. */
function nameOf(chain: CellChain, piece: number, rings: readonly GridRing[], wallNames: readonly string[]): string | null {
  const { ring } = rings[chain.ring];
  const k = chain.segments[piece];
  if (ring.marks[k] !== MARK_WALL) return null;
  return wallNames[ring.wallIds[k]] ?? null;
}

/** Least distance between two chains (grid units) and the pieces where it is reached. */
function chainGap(a: CellChain, b: CellChain): { distance: number; pieceA: number; pieceB: number } {
  let best = { distance: Infinity, pieceA: 0, pieceB: 0 };
  for (let p = 0; p < a.uv.length; p += 4) {
    for (let q = 0; q < b.uv.length; q += 4) {
      const d = segmentGap(a.uv, p, b.uv, q);
      if (d < best.distance) best = { distance: d, pieceA: p >> 2, pieceB: q >> 2 };
    }
  }
  return best;
}

/** Distance between segments a[p..p+3] and b[q..q+3] that do not cross (chains of different pieces never do). */
function segmentGap(a: readonly number[], p: number, b: readonly number[], q: number): number {
  return Math.min(
    pointToSegment(a[p], a[p + 1], b, q),
    pointToSegment(a[p + 2], a[p + 3], b, q),
    pointToSegment(b[q], b[q + 1], a, p),
    pointToSegment(b[q + 2], b[q + 3], a, p),
  );
}

function pointToSegment(x: number, y: number, s: readonly number[], at: number): number {
  const dx = s[at + 2] - s[at];
  const dy = s[at + 3] - s[at + 1];
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.max(0, Math.min(1, ((x - s[at]) * dx + (y - s[at + 1]) * dy) / len2)) : 0;
  return Math.hypot(x - s[at] - t * dx, y - s[at + 1] - t * dy);
}
