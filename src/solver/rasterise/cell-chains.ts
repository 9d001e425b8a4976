/** The rings cut into chains: runs of consecutive boundary pieces inside one cell, fluid on their left (grid units). */
import { forEachCellPiece } from './clip-pieces.ts';
import type { GridRing } from './frame.ts';

/** How far a piece's midpoint is moved into the fluid to pick its cell when it lies on a grid line, grid units (as coupling.ts). */
const NUDGE = 1e-9;

/** One run of a ring's pieces inside one cell, in the direction that keeps the fluid on the left. */
export interface CellChain {
  /** Cell index i + j * nx. */
  readonly cell: number;
  /** Index of the ring in the rasteriser's ring list (0 = outline). */
  readonly ring: number;
  /** Pieces, 4 numbers each: ua, va, ub, vb in grid units; each piece's end is the next one's start. */
  readonly uv: number[];
  /** Per piece: the ring segment it was cut from. */
  readonly segments: number[];
  /** True when the ring never leaves the cell, so the chain has no entry or exit on the cell's border. */
  closed: boolean;
}

/**
 * Every cell crossed by a ring, with its chains: Map from cell index to chains, cells in first-visit order.
 * A piece lying on a grid line goes to the cell on its fluid side, as in coupling.ts. Costs O(boundary pieces).
 */
export function cellChains(rings: readonly GridRing[], nx: number, ny: number): Map<number, CellChain[]> {
  const byCell = new Map<number, CellChain[]>();
  rings.forEach(({ uv, sense }, ringIndex) => {
    const chains = ringChains(uv, sense, ringIndex, nx, ny);
    for (const chain of chains) {
      const list = byCell.get(chain.cell);
      if (list) list.push(chain);
      else byCell.set(chain.cell, [chain]);
    }
  });
  return byCell;
}

/** One ring's chains in ring order; the run that wraps past the ring's first point is joined into one chain. */
function ringChains(uv: Float64Array, sense: 1 | -1, ringIndex: number, nx: number, ny: number): CellChain[] {
  const chains: CellChain[] = [];
  let current: CellChain | null = null;
  const n = uv.length >> 1;
  for (let k = 0; k < n; k++) {
    const m = k + 1 === n ? 0 : k + 1;
    const u0 = uv[2 * k], v0 = uv[2 * k + 1], u1 = uv[2 * m], v1 = uv[2 * m + 1];
    const length = Math.hypot(u1 - u0, v1 - v0);
    if (length === 0) continue;
    const nu = (-(v1 - v0) / length) * sense;
    const nv = ((u1 - u0) / length) * sense;
    forEachCellPiece(u0, v0, u1, v1, (ua, va, ub, vb) => {
      if (ua === ub && va === vb) return;
      const i = clampIndex(Math.floor(0.5 * (ua + ub) + NUDGE * nu), nx);
      const j = clampIndex(Math.floor(0.5 * (va + vb) + NUDGE * nv), ny);
      const cell = i + j * nx;
      if (current === null || current.cell !== cell) {
        current = { cell, ring: ringIndex, uv: [], segments: [], closed: false };
        chains.push(current);
      }
      current.uv.push(ua, va, ub, vb);
      current.segments.push(k);
    });
  }
  if (chains.length > 1 && chains[0].cell === chains[chains.length - 1].cell) {
    const last = chains.pop() as CellChain;
    const first = chains[0];
    chains[0] = { ...first, uv: [...last.uv, ...first.uv], segments: [...last.segments, ...first.segments] };
  }
  if (chains.length === 1) chains[0].closed = true;
  if (sense === -1) chains.forEach((chain, c) => (chains[c] = reversed(chain)));
  return chains;
}

/** The chain run backwards, for a ring that arrived with the fluid on its right (sense -1). */
function reversed(chain: CellChain): CellChain {
  const uv: number[] = [];
  for (let p = chain.uv.length - 4; p >= 0; p -= 4) uv.push(chain.uv[p + 2], chain.uv[p + 3], chain.uv[p], chain.uv[p + 1]);
  return { ...chain, uv, segments: [...chain.segments].reverse() };
}

function clampIndex(value: number, count: number): number {
  return value < 0 ? 0 : value >= count ? count - 1 : value;
}
