/** The valve's own frame in the section: lengths across the axis and up it, from the centre of the seat's gauge line. */

import type { Point, ValveAxis } from '../document/types.ts';

/** Unit vectors and origin of the valve frame, in document units and section coordinates. */
export interface ValveFrame {
  /** Centre of the gauge line. */
  readonly origin: Point;
  /** Direction the valve opens (down the axis, toward the cylinder). */
  readonly open: Point;
  /** Up the axis, into the port: minus `open`. */
  readonly up: Point;
  /** Across the axis, toward the valve's +x side (its right as drawn when it opens downward). */
  readonly across: Point;
}

/** The frame of `axis`: opening direction (sin i, -cos i) for inclination i, so 0 opens straight down (-y). */
export function valveFrame(axis: ValveAxis): ValveFrame {
  const i = degToRad(axis.inclinationDeg);
  const s = Math.sin(i), c = Math.cos(i);
  return { origin: [axis.x, axis.y], open: [s, -c], up: [-s, c], across: [c, s] };
}

/** Section point at `across` and `up` (document units) in the frame. */
export function toSection(frame: ValveFrame, across: number, up: number): Point {
  return [
    frame.origin[0] + across * frame.across[0] + up * frame.up[0],
    frame.origin[1] + across * frame.across[1] + up * frame.up[1],
  ];
}

/** [across, up] of section point `p` in the frame. */
export function fromSection(frame: ValveFrame, p: Point): [number, number] {
  const dx = p[0] - frame.origin[0], dy = p[1] - frame.origin[1];
  return [dx * frame.across[0] + dy * frame.across[1], dx * frame.up[0] + dy * frame.up[1]];
}

/** "left" for side -1, "right" for +1: the sides of the valve as drawn when it opens downward. */
export function sideName(side: -1 | 1): string {
  return side < 0 ? 'left' : 'right';
}

export const degToRad = (deg: number): number => (deg * Math.PI) / 180;
