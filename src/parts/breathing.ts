/**
 * The breathing numbers of a variant's parts at its lift, in the document's units: head, throat and curtain areas,
 * the minimum valve flow area and its stage (Heywood 1988, sec. 6.3.1), the port area where known, the ranking of
 * restrictions and the lift where the greatest one passes from the valve to the port side. Computed in SI by
 * src/breathing. A 2D section alone gives a width, not an area: the port area is the least area the solve found under
 * the variant's width profile, else the porter's measured value, else a round port as wide as the section's tightest
 * station, pi w^2 / 4, which is an assumption and is labelled so.
 */

import type { Parts, Units } from '../document/types.ts';
import {
  circleArea, crossoverLift, curtainArea, greatestRestriction, liftOverDiameter, minValveFlowArea, netThroatArea,
  stageBoundaries, throatArea, throatPercent, valveHeadArea, type RestrictionCandidate, type ValveFlowStage,
} from '../breathing/index.ts';
import { metresPerUnit, seatCutSI, valveHeadSI } from './si.ts';

/** Where the port area came from. */
export type PortAreaSource = 'solved least area of the width profile' | 'measured' | 'round-port assumption';

/** A port area and how it was had; `area` in document units squared. */
export interface PortAreaUsed {
  readonly name: string;
  readonly area: number;
  readonly source: PortAreaSource;
}

/** Lengths in document units, areas in document units squared. */
export interface PartsBreathing {
  readonly valveDiameter: number;
  readonly lift: number;
  /** Lift over valve diameter. */
  readonly ld: number;
  readonly headArea: number;
  readonly throatDiameter: number;
  /** Throat area pi D_p^2 / 4 (gross: the stem not taken off). */
  readonly throatArea: number;
  /** Throat area less the stem: what the throat offers in the ranking. */
  readonly throatNetArea: number;
  readonly throatPct: number;
  /** pi D L */
  readonly curtainArea: number;
  readonly minValveArea: number;
  readonly stage: ValveFlowStage;
  /** Lifts where stage 1 ends and stage 3 (throat-limited) starts. */
  readonly stage1EndLift: number;
  readonly stage3StartLift: number;
  readonly port: PortAreaUsed | null;
  /** Candidate restrictions at this lift, smallest area first. */
  readonly ranking: readonly { readonly kind: RestrictionCandidate['kind']; readonly name: string; readonly area: number }[];
  /** Name of the greatest restriction now: "valve", "throat" or the port's name. */
  readonly greatest: string;
  /** Lift at which the greatest restriction passes from the valve to the port side; null if it never does. */
  readonly crossoverLift: number | null;
}

export interface BreathingOptions {
  /**
   * Least area ahead of the valve the solve found under the variant's width profile, document units squared (the
   * reading's tightest station's area). Give it only when the variant has a width profile: it then is the port area
   * ranked, before a measured one.
   */
  readonly solvedLeastArea?: number;
  /** Width of the tightest station of the solved section, document units: used for the round-port assumption. */
  readonly tightestWidth?: number;
  /** Lift to read at instead of the valve's own, document units. */
  readonly lift?: number;
}

export const MEASURED_PORT_NAME = 'port (measured)';
export const ROUND_PORT_NAME = 'port (round-port assumption)';
export const SOLVED_PORT_NAME = 'port (least area, width profile)';

/**
 * The port area used in the ranking: the solved least area under a width profile if given, else the measured one,
 * else a round port of the tightest width, else none.
 */
export function portAreaUsed(parts: Parts, tightestWidth?: number, solvedLeastArea?: number): PortAreaUsed | null {
  if (solvedLeastArea !== undefined && solvedLeastArea > 0) {
    return { name: SOLVED_PORT_NAME, area: solvedLeastArea, source: 'solved least area of the width profile' };
  }
  if (parts.port) return { name: MEASURED_PORT_NAME, area: parts.port.tightestArea, source: 'measured' };
  if (tightestWidth !== undefined && tightestWidth > 0) {
    return { name: ROUND_PORT_NAME, area: circleArea(tightestWidth), source: 'round-port assumption' };
  }
  return null;
}

/** The breathing numbers of `parts` (null without a valve and a seat). Throws BreathingInputError for numbers it cannot use. */
export function partsBreathing(parts: Parts, units: Units, options: BreathingOptions = {}): PartsBreathing | null {
  const { valve, seat } = parts;
  if (!valve || !seat) return null;
  const k = metresPerUnit(units), k2 = k * k;
  const head = valveHeadSI(valve, units), cut = seatCutSI(valve, seat, units);
  const lift = options.lift ?? valve.lift;
  const liftM = lift * k;
  const port = portAreaUsed(parts, options.tightestWidth, options.solvedLeastArea);
  const portAreasM2 = port ? { [port.name]: port.area * k2 } : {};
  const flow = minValveFlowArea(liftM, head, cut);
  const stages = stageBoundaries(head, cut);
  const ranking = greatestRestriction(liftM, head, cut, portAreasM2);
  const crossM = crossoverLift(head, cut, portAreasM2, { fromM: 0, toM: 2 * stages.stage3StartM });
  return {
    valveDiameter: valve.diameter,
    lift,
    ld: liftOverDiameter(liftM, head.headDiameterM),
    headArea: valveHeadArea(head) / k2,
    throatDiameter: cut.throatDiameterM / k,
    throatArea: throatArea(cut) / k2,
    throatNetArea: netThroatArea(head, cut) / k2,
    throatPct: throatPercent(head, cut),
    curtainArea: curtainArea(head.headDiameterM, liftM) / k2,
    minValveArea: flow.areaM2 / k2,
    stage: flow.stage,
    stage1EndLift: stages.stage1EndM / k,
    stage3StartLift: stages.stage3StartM / k,
    port,
    ranking: ranking.map((c) => ({ kind: c.kind, name: c.name, area: c.areaM2 / k2 })),
    greatest: ranking[0].name,
    crossoverLift: crossM === null ? null : crossM / k,
  };
}
