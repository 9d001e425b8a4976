/** Cells whose fluid falls apart into separate pieces (a thin wall crosses them): each keeps only its largest piece. */
import { cellChains, type CellChain } from './cell-chains.ts';
import { cellPieces, type CellPiece } from './cell-pieces.ts';
import { pieceCoupling } from './coupling.ts';
import type { GridDepthAt } from '../depth/face-conductance.ts';
import type { GridRing } from './frame.ts';
import { MARK_INLET, MARK_OUTLET } from '../types.ts';

/** A cell holding more than one piece of fluid. */
export interface SplitCell {
  readonly i: number;
  readonly j: number;
  readonly chains: readonly CellChain[];
  readonly pieces: readonly CellPiece[];
  /** Index into `pieces` of the largest piece, the one kept. */
  readonly kept: number;
}

export interface SplitScan {
  /** Split cells, keyed by cell index i + j * nx, in the order the rings first reach them. */
  readonly cells: Map<number, SplitCell>;
  /** Cells with several chains whose walk could not be made consistent; they keep today's single-piece measures. */
  readonly fallbacks: number;
}

/**
 * Finds the split cells by walking only the cells the rings cross with two or more chains.
 * Pieces of a cell that both touch one piece of a neighbour across its faces are joined first (the fluid goes round
 * a wall's end or a sharp corner within a cell's reach, so joining them leaks nothing): a cell whose pieces all join
 * keeps today's measures. `fraction` is the cells' measured fluid fraction (row-major i + j * nx), used to check each walk.
 */
export function findSplitCells(rings: readonly GridRing[], fraction: Float64Array, nx: number, ny: number): SplitScan {
  const raw = new Map<number, { i: number; j: number; chains: CellChain[]; pieces: CellPiece[] }>();
  let fallbacks = 0;
  for (const [cell, all] of cellChains(rings, nx, ny)) {
    if (all.length < 2 || fraction[cell] === 0) continue;
    // A chain shorter than rounding (a corner grazed by a cut point) bounds nothing.
    const chains = all.filter((c) => chainLength(c) > NEGLIGIBLE_LENGTH);
    if (chains.length < 2) continue;
    const i = cell % nx;
    const j = (cell - i) / nx;
    const pieces = chains.some((c) => c.closed) ? null : cellPieces(chains, i, j, fraction[cell]);
    if (pieces === null) fallbacks++;
    else if (pieces.length > 1) raw.set(cell, { i, j, chains, pieces });
  }
  const cells = new Map<number, SplitCell>();
  for (const [cell, r] of raw) {
    const sidesOf = (c: number, side: number): (readonly number[])[] | null => raw.get(c)?.pieces.map((p) => p.sides[side]) ?? null;
    const neighbours = [sidesOf(cell - nx, 2), sidesOf(cell + 1, 3), sidesOf(cell + nx, 0), sidesOf(cell - 1, 1)];
    const pieces = joinedPieces(r.pieces, neighbours);
    if (pieces.length < 2) continue;
    let kept = 0;
    for (let p = 1; p < pieces.length; p++) if (pieces[p].area > pieces[kept].area) kept = p;
    cells.set(cell, { i: r.i, j: r.j, chains: r.chains, pieces, kept });
  }
  return { cells, fallbacks };
}

/** Chains shorter than this (grid units) are left out of the walk. */
const NEGLIGIBLE_LENGTH = 1e-9;

function chainLength(chain: CellChain): number {
  let length = 0;
  for (let p = 0; p < chain.uv.length; p += 4) length += Math.hypot(chain.uv[p + 2] - chain.uv[p], chain.uv[p + 3] - chain.uv[p + 1]);
  return length;
}

/** Overlaps shorter than this (fraction of a face) do not join pieces: they are rounding at a shared end point. */
const JOIN_OVERLAP = 1e-9;

/**
 * Joins the pieces that touch one piece of a neighbour (a neighbour that is not split counts as one piece holding the
 * whole face). `neighbours[s]` lists the neighbour's pieces' intervals on the face shared with side s, or null.
 */
function joinedPieces(pieces: readonly CellPiece[], neighbours: readonly ((readonly number[])[] | null)[]): CellPiece[] {
  const root = pieces.map((_, p) => p);
  const find = (p: number): number => (root[p] === p ? p : (root[p] = find(root[p])));
  for (let s = 0; s < 4; s++) {
    const theirs = neighbours[s] ?? [[0, 1]];
    for (const other of theirs) {
      let first = -1;
      pieces.forEach((piece, p) => {
        if (overlap(piece.sides[s], other) <= JOIN_OVERLAP) return;
        if (first < 0) first = find(p);
        else root[find(p)] = first;
      });
    }
  }
  const groups = new Map<number, { area: number; chains: number[]; sides: [number[], number[], number[], number[]] }>();
  pieces.forEach((piece, p) => {
    const g = find(p);
    const into = groups.get(g) ?? { area: 0, chains: [], sides: [[], [], [], []] };
    into.area += piece.area;
    into.chains.push(...piece.chains);
    for (let s = 0; s < 4; s++) into.sides[s].push(...piece.sides[s]);
    groups.set(g, into);
  });
  return [...groups.values()];
}

/** The measures the split cells change; layouts as in CutGrid. */
export interface CutMeasures {
  readonly cellFraction: Float64Array;
  readonly openX: Float64Array;
  readonly openY: Float64Array;
  readonly inletCoupling: Float64Array;
  readonly outletCoupling: Float64Array;
}

/**
 * Each split cell keeps its largest piece: its fraction becomes that piece's area, each of its faces stays open only
 * where the kept pieces of both cells beside it touch the face, and only the kept piece's inlet and outlet pieces
 * couple. Measures of other cells and faces are left as they are.
 */
export function keepLargestPieces(
  scan: SplitScan, rings: readonly GridRing[], m: CutMeasures, nx: number, depth: GridDepthAt | null = null,
): void {
  const strideX = nx + 1;
  for (const [cell, split] of scan.cells) {
    const { i, j } = split;
    const kept = split.pieces[split.kept];
    m.cellFraction[cell] = kept.area;
    closeFace(m.openY, i + j * nx, kept.sides[0], sideOf(scan, cell - nx, 2));
    closeFace(m.openX, i + 1 + j * strideX, kept.sides[1], sideOf(scan, cell + 1, 3));
    closeFace(m.openY, i + (j + 1) * nx, kept.sides[2], sideOf(scan, cell + nx, 0));
    closeFace(m.openX, i + j * strideX, kept.sides[3], sideOf(scan, cell - 1, 1));
    m.inletCoupling[cell] = keptCoupling(split, rings, MARK_INLET, depth);
    m.outletCoupling[cell] = keptCoupling(split, rings, MARK_OUTLET, depth);
  }
}

/** The kept piece's intervals on `side` of a neighbour cell, or null when the neighbour is whole (not split). */
function sideOf(scan: SplitScan, cell: number, side: number): number[] | null {
  const split = scan.cells.get(cell);
  return split ? split.pieces[split.kept].sides[side] : null;
}

/** Open fraction = the least of today's and the overlap of both cells' intervals on the face. */
function closeFace(open: Float64Array, face: number, mine: readonly number[], theirs: readonly number[] | null): void {
  open[face] = Math.min(open[face], theirs === null ? measure(mine) : overlap(mine, theirs));
}

function measure(intervals: readonly number[]): number {
  let sum = 0;
  for (let k = 0; k < intervals.length; k += 2) sum += intervals[k + 1] - intervals[k];
  return sum;
}

/** Total length where two interval lists (each without self-overlap) overlap. */
function overlap(a: readonly number[], b: readonly number[]): number {
  let sum = 0;
  for (let p = 0; p < a.length; p += 2) {
    for (let q = 0; q < b.length; q += 2) sum += Math.max(0, Math.min(a[p + 1], b[q + 1]) - Math.max(a[p], b[q]));
  }
  return sum;
}

/** Coupling of the split cell to `mark` from the kept piece's chains only (as coupling.ts measures each piece). */
function keptCoupling(split: SplitCell, rings: readonly GridRing[], mark: number, depth: GridDepthAt | null): number {
  let total = 0;
  for (const c of split.pieces[split.kept].chains) {
    const chain = split.chains[c];
    const { uv, ring, sense } = rings[chain.ring];
    const n = uv.length >> 1;
    chain.segments.forEach((k, p) => {
      if (ring.marks[k] !== mark) return;
      const q = k + 1 === n ? 0 : k + 1;
      const du = uv[2 * q] - uv[2 * k];
      const dv = uv[2 * q + 1] - uv[2 * k + 1];
      const length = Math.hypot(du, dv);
      const at = 4 * p;
      const piece = chain.uv;
      total += pieceCoupling(piece[at], piece[at + 1], piece[at + 2], piece[at + 3], (-dv / length) * sense, (du / length) * sense, split.i, split.j, depth);
    });
  }
  return total;
}
