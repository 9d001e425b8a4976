/**
 * The valve's own handles: where the lift and valve-axis handles sit, and the lift or axis a drag of them means.
 * The lift handle is the centre of the valve face, which lift moves along the opening direction; the axis handle is
 * the centre of the seat's gauge line, the point the valve, seat and test bore are all placed from.
 */

import type { Parts, Point, ValveAxis, ValvePart } from '../document/types.ts';
import { toSection, valveFrame } from '../parts/frame.ts';
import type { PartHandleRef } from './refs.ts';
import { roundToStep } from './snap.ts';

/**
 * Most lift a drag of the lift handle gives, as a share of the valve diameter. Street and race intakes stay under
 * about 0.35 D (common practice); half the diameter leaves room to sweep past that without driving the valve
 * into the bottom of the test bore.
 */
export const MAX_LIFT_SHARE = 0.5;

/** Centre of the valve face (document units): `margin + lift` down the opening direction from the gauge line's centre. */
export function liftHandlePosition(valve: ValvePart): Point {
  return toSection(valveFrame(valve.axis), 0, -(valve.margin + valve.lift));
}

/** Centre of the seat's gauge line: the valve axis point (document units). */
function axisHandlePosition(valve: ValvePart): Point {
  return [valve.axis.x, valve.axis.y];
}

/** The valve's handles, lift first; none without a valve part. */
export function partHandles(parts: Parts | undefined): { ref: PartHandleRef; at: Point }[] {
  const valve = parts?.valve;
  if (valve === undefined) return [];
  return [{ ref: { kind: 'lift' }, at: liftHandlePosition(valve) }, { ref: { kind: 'valve-axis' }, at: axisHandlePosition(valve) }];
}

/** Where part handle `ref` is, or null without a valve part. */
export function partHandlePosition(parts: Parts | undefined, ref: PartHandleRef): Point | null {
  const valve = parts?.valve;
  if (valve === undefined) return null;
  return ref.kind === 'lift' ? liftHandlePosition(valve) : axisHandlePosition(valve);
}

/**
 * The lift (document units) meant by moving the pointer by `moved` (document units) since grabbing the lift handle of
 * `valve` (as it was when grabbed): only the part of the move along the opening direction counts, so a drag across the
 * axis leaves the lift alone. Rounded to `gridStep` when it is above 0, then held to 0 .. MAX_LIFT_SHARE x diameter.
 * Example: a 46 valve at lift 10, axis straight down, dragged (3, -2.5): lift 12.5.
 */
export function liftFromDrag(valve: ValvePart, moved: Point, gridStep = 0): number {
  const { open } = valveFrame(valve.axis);
  const raw = valve.lift + moved[0] * open[0] + moved[1] * open[1];
  const lift = gridStep > 0 ? roundToStep(raw, gridStep) : raw;
  return Math.min(MAX_LIFT_SHARE * valve.diameter, Math.max(0, lift));
}

/** The valve axis moved by `moved` (document units): its gauge-line centre only, the lean stays. */
export function axisFromDrag(valve: ValvePart, moved: Point): Pick<ValveAxis, 'x' | 'y'> {
  return { x: valve.axis.x + moved[0], y: valve.axis.y + moved[1] };
}
