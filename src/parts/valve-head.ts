/**
 * The valve head as an island: the 2D section through the valve axis of a flat-faced head with a margin,
 * a seat face, a back cut up to the head's thickness, a flat back and a filleted neck into a stub of stem.
 */

import type { Edge, Island, ValvePart, Vertex } from '../document/types.ts';
import { PartsError } from './errors.ts';
import { degToRad, toSection, valveFrame } from './frame.ts';

/** The island's name: the flow reading knows the valve by it, and regenerating replaces the island of this name. */
export const VALVE_ISLAND_NAME = 'valve head';
/** Share of the room the neck fillet takes (flat back length or stem above the head, the smaller). */
const NECK_FILLET_SHARE = 0.8;

/** One side of the head in its own frame: [across >= 0, height above the face], face edge first, stem top last. */
export interface ValveHalfProfile {
  readonly points: readonly (readonly [number, number])[];
  /** Index in `points` of the corner where the flat back meets the stem. */
  readonly neckIndex: number;
  /** Fillet radius at that corner, document units. */
  readonly neckFillet: number;
}

function valveError(message: string): PartsError {
  return new PartsError('valve-shape', 'valve', message);
}

/** The right half of the head profile (the left is its mirror). Throws PartsError if the numbers make no head. */
export function valveHalfProfile(valve: ValvePart): ValveHalfProfile {
  const R = valve.diameter / 2, rs = valve.stemDiameter / 2, T = valve.headThickness;
  if (rs >= R) throw valveError(`The stem (${valve.stemDiameter}) must be thinner than the valve head (${valve.diameter}).`);
  const seat = degToRad(valve.seatAngleDeg), back = degToRad(valve.backCutAngleDeg);
  const r1 = R - valve.seatFaceWidth * Math.cos(seat);
  const h1 = valve.margin + valve.seatFaceWidth * Math.sin(seat);
  if (r1 <= rs) throw valveError('The seat face is so wide that it reaches the stem; make it narrower.');
  if (h1 >= T) {
    throw valveError(`The head (${T} thick) must be thicker than its margin and seat face together (${round(h1)}).`);
  }
  const r2 = r1 - (T - h1) / Math.tan(back);
  if (r2 <= rs) {
    throw valveError(
      `The back cut at ${valve.backCutAngleDeg} degrees reaches the stem before the head is ${T} thick: ` +
        'make the back cut steeper or the head thinner.',
    );
  }
  if (valve.stemLength <= T) throw valveError(`The stem length (${valve.stemLength}) must be more than the head thickness (${T}).`);
  const points: [number, number][] = [[R, 0]];
  if (valve.margin > 0) points.push([R, valve.margin]);
  points.push([r1, h1], [r2, T], [rs, T], [rs, valve.stemLength]);
  const neckFillet = NECK_FILLET_SHARE * Math.min(r2 - rs, valve.stemLength - T);
  return { points, neckIndex: points.length - 2, neckFillet };
}

/**
 * The valve head island at its lift: shut, the outer edge of its seat face sits on the gauge line (the axis
 * point), so its face lies `margin` below it; lift moves the whole island along the opening direction.
 */
export function valveIsland(valve: ValvePart): Island {
  const half = valveHalfProfile(valve);
  const frame = valveFrame(valve.axis);
  const faceUp = -valve.margin - valve.lift;
  const vertex = (across: number, height: number, fillet: boolean): Vertex => {
    const at = toSection(frame, across, faceUp + height);
    return fillet ? { at, filletRadius: half.neckFillet } : { at };
  };
  const right = half.points.map(([a, h], i) => vertex(a, h, i === half.neckIndex));
  const left = half.points.map(([a, h], i) => vertex(-a, h, i === half.neckIndex)).reverse();
  const vertices = [...right, ...left];
  return { name: VALVE_ISLAND_NAME, outline: { vertices, edges: vertices.map((): Edge => ({ kind: 'line', role: 'wall' })) } };
}

const round = (x: number): number => Math.round(x * 1000) / 1000;
