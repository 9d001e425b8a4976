/**
 * The flow-bench test bore under the deck: a rectangle `diameter` wide and `depth` deep, walls along the cylinder
 * axis (y), its bottom the outlet. The nearer wall is `valveEdgeToWall` from the valve edge, on the manifold side.
 */

import type { BorePart, Outline, SeatPart, ValvePart } from '../document/types.ts';
import { degToRad } from './frame.ts';
import { deckLevel } from './seat.ts';

/** The bore in section coordinates. */
export interface BoreBox {
  /** x of the wall nearer the valve (on the manifold side) and of the far wall. */
  readonly nearWallX: number;
  readonly farWallX: number;
  /** -1 or +1: the side (in x) of the valve the manifold, and so the nearer wall, is on. */
  readonly nearSide: -1 | 1;
  /** Deck (top of the bore) and bottom (the outlet) y. */
  readonly topY: number;
  readonly bottomY: number;
}

/**
 * Which side of the valve axis (in x) the manifold is on: the side of the mean point of the inlet edges' ends.
 * A section with no inlet, or one straight above the axis, counts as the left (-1).
 */
export function manifoldSide(outline: Outline, axisX: number): -1 | 1 {
  let sum = 0, count = 0;
  const n = outline.vertices.length;
  outline.edges.forEach((edge, i) => {
    if (edge.role !== 'inlet') return;
    sum += outline.vertices[i].at[0] + outline.vertices[(i + 1) % n].at[0];
    count += 2;
  });
  return count > 0 && sum / count > axisX ? 1 : -1;
}

/** Where the bore sits: the valve edge (shut, at the gauge line) is `valveEdgeToWall` from the nearer wall. */
export function boreBox(valve: ValvePart, seat: SeatPart, bore: BorePart, nearSide: -1 | 1): BoreBox {
  const edgeReach = (valve.diameter / 2) * Math.cos(degToRad(valve.axis.inclinationDeg));
  const nearWallX = valve.axis.x + nearSide * (edgeReach + bore.valveEdgeToWall);
  const topY = deckLevel(valve, seat);
  return { nearWallX, farWallX: nearWallX - nearSide * bore.diameter, nearSide, topY, bottomY: topY - bore.depth };
}

/** x of the bore wall on side `side` (-1 left, +1 right). */
export function wallX(box: BoreBox, side: -1 | 1): number {
  return side === box.nearSide ? box.nearWallX : box.farWallX;
}
