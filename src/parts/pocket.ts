/**
 * The generated stretch of outline between the two anchor corners: down one seat ring, along the deck, round the
 * test bore (its bottom the outlet), along the deck and up the other ring. Edges are walls named for what they are
 * and which side of the valve they are on (see wallNames): "bowl" (joining an anchor that is off the throat line),
 * "throat" and "seat" (bottom cut, seat face, top cut) as "... (short side)" or "... (long side)", and "deck" and
 * "bore wall" as "... (manifold side)" or "... (far side)".
 */

import type { BorePart, Edge, Outline, Point, SeatPart, ValvePart, Vertex } from '../document/types.ts';
import { PartsError } from './errors.ts';
import { fromSection, sideName, toSection, valveFrame } from './frame.ts';
import { boreBox, manifoldSide, wallX, type BoreBox } from './bore.ts';
import { heightOnAxis, seatRing } from './seat.ts';

/** A corner of the stretch and the edge leaving it. */
interface Step {
  readonly at: Point;
  readonly next: Edge;
}

const wall = (wallName: string): Edge => ({ kind: 'line', role: 'wall', wallName });
const OUTLET: Edge = { kind: 'line', role: 'outlet' };

/** Corners closer than this share of the valve diameter are one corner (an anchor on the throat line, a flush seat). */
const SAME_POINT_SHARE = 1e-9;

/** The generated walls' names on one side of the valve. */
interface SideNames {
  readonly bowl: string;
  readonly throat: string;
  readonly seat: string;
  readonly deck: string;
  readonly boreWall: string;
}

/**
 * Wall names on side `side` of the valve, given the side the manifold is on. The porter's reading: the port and
 * seat on the manifold side are the short side's (where the floor turns down into the bowl), the others the long
 * side's; past the seat, the deck and test bore have no short or long side, only the manifold side and the far side.
 */
export function wallNames(side: -1 | 1, manifold: -1 | 1): SideNames {
  const port = side === manifold ? '(short side)' : '(long side)';
  const past = side === manifold ? '(manifold side)' : '(far side)';
  return { bowl: `bowl ${port}`, throat: `throat ${port}`, seat: `seat ${port}`, deck: `deck ${past}`, boreWall: `bore wall ${past}` };
}

/** One side's ring from its anchor down to the deck point, with the edge leaving each corner. */
function ringDown(valve: ValvePart, seat: SeatPart, anchor: Point, side: -1 | 1, names: SideNames): Step[] {
  const ring = seatRing(valve, seat, side);
  const frame = valveFrame(valve.axis);
  const anchorUp = heightOnAxis(valve, anchor);
  const bottomUp = fromSection(frame, ring.throatBottom)[1];
  const steps: Step[] = [{ at: anchor, next: wall(names.bowl) }];
  if (anchorUp > bottomUp) steps.push({ at: toSection(frame, ring.throatAcross, anchorUp), next: wall(names.throat) });
  steps.push(
    { at: ring.throatBottom, next: wall(names.seat) },
    { at: ring.seatInner, next: wall(names.seat) },
    { at: ring.seatOuter, next: wall(names.seat) },
    { at: ring.deck, next: wall(names.deck) },
  );
  return steps;
}

function checkDeckInsideBore(deck: Point, box: BoreBox, side: -1 | 1): void {
  if ((wallX(box, side) - deck[0]) * side < 0) {
    const which = side === box.nearSide ? 'move the nearer wall out (valve edge to wall)' : 'make the bore wider';
    throw new PartsError('bore-shape', 'bore', `On the ${sideName(side)} the test bore wall cuts into the seat's top cut: ${which}.`);
  }
}

/**
 * The stretch from anchor `from` to anchor `to` (both kept as they are), for an outline whose inlet is given
 * by `outline`: the corners strictly between the anchors and the edges leaving `from` and each of them.
 */
export function pocketStretch(
  valve: ValvePart, seat: SeatPart, bore: BorePart, outline: Outline, from: Point, to: Point,
): { vertices: Vertex[]; edges: Edge[] } {
  const frame = valveFrame(valve.axis);
  const sideOf = (p: Point): -1 | 1 => (fromSection(frame, p)[0] < 0 ? -1 : 1);
  const first = sideOf(from), last = sideOf(to);
  if (first === last) {
    throw new PartsError('anchors', 'outline', `Both anchor corners are on the ${sideName(first)} of the valve axis; put one on each side.`);
  }
  const box = boreBox(valve, seat, bore, manifoldSide(outline, valve.axis.x));
  const firstNames = wallNames(first, box.nearSide), lastNames = wallNames(last, box.nearSide);
  const down = ringDown(valve, seat, from, first, firstNames);
  const up = ringDown(valve, seat, to, last, lastNames).reverse();
  checkDeckInsideBore(down[down.length - 1].at, box, first);
  checkDeckInsideBore(up[0].at, box, last);
  const across: Step[] = [
    { at: [wallX(box, first), box.topY], next: wall(firstNames.boreWall) },
    { at: [wallX(box, first), box.bottomY], next: OUTLET },
    { at: [wallX(box, last), box.bottomY], next: wall(lastNames.boreWall) },
    { at: [wallX(box, last), box.topY], next: wall(lastNames.deck) },
  ];
  // Going up, each corner leaves by the edge that came down into it; the far anchor's own edge is not generated.
  const upSteps = up.map((s, i) => ({ at: s.at, next: i + 1 < up.length ? up[i + 1].next : wall(lastNames.bowl) }));
  return joinSteps([...down, ...across, ...upSteps], valve.diameter * SAME_POINT_SHARE);
}

/**
 * Drops corners that coincide with the one before, keeping the edge that leaves the later one (so an anchor on the
 * throat line leaves by the throat); the last step is the far anchor, whose own corner is not returned.
 */
function joinSteps(steps: readonly Step[], tolerance: number): { vertices: Vertex[]; edges: Edge[] } {
  const kept: Step[] = [steps[0]];
  for (let k = 1; k < steps.length - 1; k++) {
    const prev = kept[kept.length - 1];
    if (near(prev.at, steps[k].at, tolerance)) kept[kept.length - 1] = { at: prev.at, next: steps[k].next };
    else kept.push(steps[k]);
  }
  const end = steps[steps.length - 1].at;
  // A corner on top of the far anchor goes; the edge into it now runs to the anchor.
  while (kept.length > 1 && near(kept[kept.length - 1].at, end, tolerance)) kept.pop();
  return { vertices: kept.slice(1).map((s) => ({ at: s.at })), edges: kept.map((s) => s.next) };
}

function near(a: Point, b: Point, tolerance: number): boolean {
  return Math.abs(a[0] - b[0]) <= tolerance && Math.abs(a[1] - b[1]) <= tolerance;
}
