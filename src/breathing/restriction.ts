/** The greatest restriction at a lift (valve, throat or a named port section) and the lift where it leaves the valve. */

import { BreathingInputError, requireNonNegative, requirePositive } from './errors.ts';
import { minValveFlowArea, netThroatArea, type SeatCut, type ValveHead } from './valve-areas.ts';

/** Port-side flow areas known by name, m^2, e.g. { 'pushrod pinch': 9.1e-4, 'manifold face': 1.2e-3 }. */
export type PortAreas = Readonly<Record<string, number>>;

/** One candidate restriction. */
export interface RestrictionCandidate {
  /** 'valve' (min flow area past the head and seat), 'throat' (net of stem) or a port section. */
  readonly kind: 'valve' | 'throat' | 'port';
  /** Name shown to the porter: "valve", "throat" or the port section's name. */
  readonly name: string;
  /** m^2 */
  readonly areaM2: number;
}

function checkPortAreas(portAreasM2: PortAreas): void {
  for (const [name, area] of Object.entries(portAreasM2)) {
    if (!Number.isFinite(area) || area <= 0) {
      throw new BreathingInputError('portAreasM2', `Port area "${name}" must be a number above zero (got ${area}).`);
    }
  }
}

/** Throat and named port sections: everything upstream of the valve. */
function portSide(valve: ValveHead, seat: SeatCut, portAreasM2: PortAreas): RestrictionCandidate[] {
  checkPortAreas(portAreasM2);
  const named = Object.entries(portAreasM2).map(([name, areaM2]) => ({ kind: 'port' as const, name, areaM2 }));
  return [{ kind: 'throat', name: 'throat', areaM2: netThroatArea(valve, seat) }, ...named];
}

/**
 * Candidate areas at a lift (m), smallest first: the first is the greatest restriction now.
 * Ties go to the port side: once the valve is throat-limited (stage 3) its flow area is the throat itself.
 */
export function greatestRestriction(
  liftM: number,
  valve: ValveHead,
  seat: SeatCut,
  portAreasM2: PortAreas = {},
): RestrictionCandidate[] {
  const valveArea = minValveFlowArea(liftM, valve, seat).areaM2;
  const port = portSide(valve, seat, portAreasM2);
  const all: RestrictionCandidate[] = [...port, { kind: 'valve', name: 'valve', areaM2: valveArea }];
  // Array.prototype.sort is stable, so the port side stays ahead of the valve on an exact tie.
  return all.sort((a, b) => a.areaM2 - b.areaM2);
}

/** Lift range (m) searched for the crossover. */
export interface LiftRange {
  readonly fromM: number;
  readonly toM: number;
}

/**
 * Lift (m) at which the smallest area passes from the valve to the port side (throat or a named section),
 * found by bisection to `toleranceM`. The valve's flow area never falls as lift rises, so there is one crossover.
 * Returns null if it does not happen inside the range: the valve still restricts at `toM`, or the port side
 * already restricts at `fromM`.
 */
export function crossoverLift(
  valve: ValveHead,
  seat: SeatCut,
  portAreasM2: PortAreas,
  range: LiftRange,
  toleranceM = 1e-7,
): number | null {
  requireNonNegative(range.fromM, 'fromM', 'Lowest lift');
  requirePositive(toleranceM, 'toleranceM', 'Lift tolerance');
  if (!(range.toM > range.fromM)) {
    throw new BreathingInputError('toM', 'The highest lift must be above the lowest lift.');
  }
  const portMin = Math.min(...portSide(valve, seat, portAreasM2).map((c) => c.areaM2));
  const portLimits = (liftM: number): boolean => minValveFlowArea(liftM, valve, seat).areaM2 >= portMin;
  if (portLimits(range.fromM) || !portLimits(range.toM)) return null;
  let lo = range.fromM; // valve restricts here
  let hi = range.toM; // port side restricts here
  while (hi - lo > toleranceM) {
    const mid = 0.5 * (lo + hi);
    if (portLimits(mid)) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}
