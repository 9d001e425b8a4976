/** Poppet-valve and seat areas: head, throat, curtain, L/D, and the minimum flow area at a lift (Heywood's three stages). */

import { BreathingInputError, requireNonNegative, requirePositive, requireWithin } from './errors.ts';

/** The valve itself. Lengths in m. */
export interface ValveHead {
  /** Outside diameter of the head, D_v, m. */
  readonly headDiameterM: number;
  /** Stem diameter where it passes the throat, D_s, m. */
  readonly stemDiameterM: number;
}

/** The seat cut and the throat under it. Lengths in m. */
export interface SeatCut {
  /** Seat angle beta, degrees from the plane of the valve head (45 usual, 30 for a flatter seat). */
  readonly angleDeg: number;
  /** Seat width w measured along the seat face, m. */
  readonly widthM: number;
  /** Throat (port bore just under the seat) diameter D_p, m. */
  readonly throatDiameterM: number;
}

/** Which of the three conical-seat stages sets the minimum flow area. */
export type ValveFlowStage = 1 | 2 | 3;

/** Area of a circle of diameter d (m) in m^2. */
export const circleArea = (diameterM: number): number => (Math.PI / 4) * diameterM * diameterM;

/** Valve head area pi D_v^2 / 4, m^2. */
export function valveHeadArea(valve: ValveHead): number {
  return circleArea(requirePositive(valve.headDiameterM, 'headDiameterM', 'Valve head diameter'));
}

/** Throat area pi D_p^2 / 4, m^2 (gross: the stem is not taken off). */
export function throatArea(seat: SeatCut): number {
  return circleArea(requirePositive(seat.throatDiameterM, 'throatDiameterM', 'Throat diameter'));
}

/** Throat area less the stem, (pi/4)(D_p^2 - D_s^2), m^2: the area air actually has at the throat. */
export function netThroatArea(valve: ValveHead, seat: SeatCut): number {
  return throatArea(seat) - circleArea(valve.stemDiameterM);
}

/** Throat diameter as a percentage of the valve head diameter. */
export function throatPercent(valve: ValveHead, seat: SeatCut): number {
  return (100 * seat.throatDiameterM) / requirePositive(valve.headDiameterM, 'headDiameterM', 'Valve head diameter');
}

/** Throat diameter (m) that gives `percent` of the head diameter, e.g. 91 % of 40 mm -> 36.4 mm. */
export function throatForPercent(headDiameterM: number, percent: number): number {
  requirePositive(headDiameterM, 'headDiameterM', 'Valve head diameter');
  return (headDiameterM * requireWithin(percent, 0, 100, 'throatPercent', 'Throat percentage')) / 100;
}

/** Curtain area pi D_v L, m^2: the side of the cylinder between head and seat at lift L. */
export function curtainArea(headDiameterM: number, liftM: number): number {
  requirePositive(headDiameterM, 'headDiameterM', 'Valve head diameter');
  return Math.PI * headDiameterM * requireNonNegative(liftM, 'liftM', 'Valve lift');
}

/** Lift over head diameter, L/D (dimensionless). At 0.25 the curtain equals the head area. */
export function liftOverDiameter(liftM: number, headDiameterM: number): number {
  requireNonNegative(liftM, 'liftM', 'Valve lift');
  return liftM / requirePositive(headDiameterM, 'headDiameterM', 'Valve head diameter');
}

/** Checks the valve and seat can exist together; throws a porter-readable error otherwise. */
export function checkValveAndSeat(valve: ValveHead, seat: SeatCut): void {
  requirePositive(valve.headDiameterM, 'headDiameterM', 'Valve head diameter');
  requireNonNegative(valve.stemDiameterM, 'stemDiameterM', 'Stem diameter');
  requirePositive(seat.widthM, 'widthM', 'Seat width');
  requirePositive(seat.throatDiameterM, 'throatDiameterM', 'Throat diameter');
  if (!(seat.angleDeg > 0 && seat.angleDeg < 90)) {
    throw new BreathingInputError('angleDeg', `Seat angle must be between 0 and 90 degrees (got ${seat.angleDeg}).`);
  }
  if (2 * seat.widthM >= valve.headDiameterM) {
    throw new BreathingInputError('widthM', 'Seat width must be less than half the valve head diameter.');
  }
  if (valve.stemDiameterM >= seat.throatDiameterM) {
    throw new BreathingInputError('stemDiameterM', 'The stem must be thinner than the throat.');
  }
}

/** Minimum flow area at a lift and the stage that sets it. */
export interface ValveFlowArea {
  /** m^2 */
  readonly areaM2: number;
  readonly stage: ValveFlowStage;
}

/** Lifts (m) where stage 1 ends and stage 3 (throat-limited) begins. */
export interface StageBoundaries {
  readonly stage1EndM: number;
  readonly stage3StartM: number;
}

/** Stage 1 area: frustum normal to the seat, pi L cos b (D_v - 2w + (L/2) sin 2b). */
function stage1Area(liftM: number, valve: ValveHead, seat: SeatCut, b: number): number {
  const { headDiameterM: Dv } = valve;
  const w = seat.widthM;
  return Math.PI * liftM * Math.cos(b) * (Dv - 2 * w + (liftM / 2) * Math.sin(2 * b));
}

/** Stage 2 area: slant from the seat's inner edge to the head, pi D_m sqrt((L - w tan b)^2 + w^2). */
function stage2Area(liftM: number, valve: ValveHead, seat: SeatCut, b: number): number {
  const w = seat.widthM;
  const Dm = valve.headDiameterM - w;
  const s = liftM - w * Math.tan(b);
  return Math.PI * Dm * Math.sqrt(s * s + w * w);
}

/**
 * Stage boundaries of the conical-seat valve (Heywood 1988, sec. 6.3.1):
 * stage 1 ends at w / (sin b cos b); stage 3 starts at sqrt(((D_p^2 - D_s^2)/(4 D_m))^2 - w^2) + w tan b.
 * If the throat is so small that it limits the flow before stage 2 is reached, stage 3 starts inside stage 1,
 * where the stage-1 area first equals the net throat area (a quadratic in L).
 */
export function stageBoundaries(valve: ValveHead, seat: SeatCut): StageBoundaries {
  checkValveAndSeat(valve, seat);
  const b = (seat.angleDeg * Math.PI) / 180;
  const w = seat.widthM;
  const Dm = valve.headDiameterM - w;
  const stage1EndM = w / (Math.sin(b) * Math.cos(b));
  const reach = (seat.throatDiameterM ** 2 - valve.stemDiameterM ** 2) / (4 * Dm);
  const L3 = reach > w ? Math.sqrt(reach * reach - w * w) + w * Math.tan(b) : -Infinity;
  if (L3 >= stage1EndM) return { stage1EndM, stage3StartM: L3 };
  // pi cos b (sin 2b / 2) L^2 + pi cos b (D_v - 2w) L - A3 = 0, positive root.
  const qa = Math.PI * Math.cos(b) * (Math.sin(2 * b) / 2);
  const qb = Math.PI * Math.cos(b) * (valve.headDiameterM - 2 * w);
  const A3 = netThroatArea(valve, seat);
  const root = (2 * A3) / (qb + Math.sqrt(qb * qb + 4 * qa * A3));
  return { stage1EndM: root, stage3StartM: root };
}

/**
 * Minimum flow area of a conical-seat poppet valve at lift L (m), m^2, and its stage
 * (Heywood, Internal Combustion Engine Fundamentals, 1988, sec. 6.3.1). The stages join without a jump.
 * Example: D_v 40, w 1.5, D_p 34, D_s 7 mm, 45 deg, L 2 mm -> 168.830 mm^2, stage 1.
 */
export function minValveFlowArea(liftM: number, valve: ValveHead, seat: SeatCut): ValveFlowArea {
  requireNonNegative(liftM, 'liftM', 'Valve lift');
  const { stage1EndM, stage3StartM } = stageBoundaries(valve, seat);
  const b = (seat.angleDeg * Math.PI) / 180;
  if (liftM >= stage3StartM) return { areaM2: netThroatArea(valve, seat), stage: 3 };
  if (liftM <= stage1EndM) return { areaM2: stage1Area(liftM, valve, seat, b), stage: 1 };
  return { areaM2: stage2Area(liftM, valve, seat, b), stage: 2 };
}
