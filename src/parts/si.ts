/** Parts in SI for src/breathing: document lengths to metres, and the valve and seat as the calculator takes them. */

import type { SeatPart, Units, ValvePart } from '../document/types.ts';
import { M_PER_INCH, type SeatCut, type ValveHead } from '../breathing/index.ts';
import { throatDiameter } from './seat.ts';

/** Metres per document length unit. */
export function metresPerUnit(units: Units): number {
  return units === 'inch' ? M_PER_INCH : 1e-3;
}

/** The valve head as src/breathing takes it (m). */
export function valveHeadSI(valve: ValvePart, units: Units): ValveHead {
  const k = metresPerUnit(units);
  return { headDiameterM: valve.diameter * k, stemDiameterM: valve.stemDiameter * k };
}

/** The seat as src/breathing takes it (m): its face at the valve's seat angle, the throat at throatPct of the valve. */
export function seatCutSI(valve: ValvePart, seat: SeatPart, units: Units): SeatCut {
  const k = metresPerUnit(units);
  return { angleDeg: valve.seatAngleDeg, widthM: seat.seatWidth * k, throatDiameterM: throatDiameter(valve, seat) * k };
}
