/**
 * One seat ring of the section (the seat on one side of the valve axis): throat wall, bottom cut, seat face at the
 * valve's seat angle, and top cut down to the deck. In the section a round seat shows as two such rings.
 */

import type { Point, SeatPart, ValvePart } from '../document/types.ts';
import { PartsError } from './errors.ts';
import { degToRad, fromSection, sideName, toSection, valveFrame, type ValveFrame } from './frame.ts';

/** The corners of one seat ring, section coordinates, from the throat down to the deck. */
export interface SeatRing {
  readonly side: -1 | 1;
  /** Across coordinate of the throat wall in the valve frame (throat radius times side, plus the offset). */
  readonly throatAcross: number;
  /** Where the bottom cut meets the throat wall. */
  readonly throatBottom: Point;
  /** Inner edge of the seat face. */
  readonly seatInner: Point;
  /** Outer edge of the seat face: the end of the gauge line. */
  readonly seatOuter: Point;
  /** Where the top cut meets the deck. */
  readonly deck: Point;
}

function seatError(message: string): PartsError {
  return new PartsError('seat-shape', 'seat', message);
}

/** Throat diameter in document units: throatPct of the valve diameter (91 % of 40 is 36.4). */
export function throatDiameter(valve: ValvePart, seat: SeatPart): number {
  return (seat.throatPct / 100) * valve.diameter;
}

/** Deck level y (document units): `recess` below the gauge line's centre. */
export function deckLevel(valve: ValvePart, seat: SeatPart): number {
  return valve.axis.y - seat.recess;
}

/**
 * The seat ring on `side` (-1 left, +1 right of the axis as drawn). The seat face runs inward and up from the gauge
 * line at the valve's seat angle for `seatWidth`; the bottom cut runs on inward and up to the throat wall; the top
 * cut runs outward and down from the gauge line to the deck. Throws PartsError when the numbers make no ring.
 */
export function seatRing(valve: ValvePart, seat: SeatPart, side: -1 | 1): SeatRing {
  const frame = valveFrame(valve.axis);
  const R = valve.diameter / 2, beta = degToRad(valve.seatAngleDeg);
  const innerR = R - seat.seatWidth * Math.cos(beta), innerUp = seat.seatWidth * Math.sin(beta);
  if (innerR <= 0) throw seatError('The seat is wider than the valve can carry; make it narrower.');
  const throatR = throatDiameter(valve, seat) / 2;
  const offset = (seat.throatOffsetPct / 100) * throatR;
  const throatAcross = side * throatR + offset;
  const step = innerR - side * throatAcross; // inward from the seat's inner edge to the throat wall
  if (step < 0) {
    throw seatError(
      `On the ${sideName(side)} the throat reaches past the seat's inner edge (the throat is ${fmt(2 * throatR)} across, ` +
        `offset ${fmt(offset)}); make the throat smaller, the offset less or the seat narrower.`,
    );
  }
  const bottomUp = innerUp + step * Math.tan(degToRad(seat.bottomCutAngleDeg));
  return {
    side,
    throatAcross,
    throatBottom: toSection(frame, throatAcross, bottomUp),
    seatInner: toSection(frame, side * innerR, innerUp),
    seatOuter: toSection(frame, side * R, 0),
    deck: topCutToDeck(frame, valve, seat, side),
  };
}

/** Where the top cut from the gauge line's end on `side` meets the deck (y = deck level). */
function topCutToDeck(frame: ValveFrame, valve: ValvePart, seat: SeatPart, side: -1 | 1): Point {
  const R = valve.diameter / 2, alpha = degToRad(seat.topCutAngleDeg);
  const start = toSection(frame, side * R, 0);
  const deckY = deckLevel(valve, seat);
  if (start[1] < deckY) {
    throw seatError(`On the ${sideName(side)} the seat's outer edge lies below the deck; make the recess larger.`);
  }
  // Outward across the axis and down it at the top-cut angle, in section coordinates.
  const dir = toSection({ ...frame, origin: [0, 0] }, side * Math.cos(alpha), -Math.sin(alpha));
  if (start[1] === deckY) return start;
  if (dir[1] >= 0) {
    throw seatError(
      `On the ${sideName(side)} the top cut at ${seat.topCutAngleDeg} degrees never reaches the deck: ` +
        'the valve leans more than the cut is steep. Make the top cut steeper.',
    );
  }
  const t = (deckY - start[1]) / dir[1];
  return [start[0] + t * dir[0], deckY];
}

/** Height up the valve axis of section point `p`, document units (the anchors' level sets the throat's top). */
export function heightOnAxis(valve: ValvePart, p: Point): number {
  return fromSection(valveFrame(valve.axis), p)[1];
}

const fmt = (x: number): string => String(Math.round(x * 1000) / 1000);
