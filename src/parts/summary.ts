/** The breathing block of the headless `solve --json` output: a variant's numbers at its lift, in the document's units. */

import type { Units, Variant } from '../document/types.ts';
import type { ValveFlowStage } from '../breathing/index.ts';
import { partsBreathing, type BreathingOptions, type PortAreaUsed } from './breathing.ts';

/** Lengths in document units, areas in document units squared. */
export interface BreathingSummary {
  readonly valveDiameter: number;
  readonly lift: number;
  readonly ld: number;
  readonly curtainArea: number;
  readonly minValveArea: number;
  readonly stage: ValveFlowStage;
  /** Gross throat area, pi D_p^2 / 4. */
  readonly throatArea: number;
  readonly throatPct: number;
  /** The port area ranked, its name and where it came from (document units squared); null when none was. */
  readonly port: PortAreaUsed | null;
  /** Name of the greatest restriction at this lift: "valve", "throat" or a port area's name. */
  readonly greatest: string;
  /** Lift where the greatest restriction passes from the valve to the port side, or null. */
  readonly crossoverLift: number | null;
}

/**
 * The breathing numbers of `variant` in `units` (the document's), or null when it has no valve and seat parts.
 * Pass the tightest station's width (document units) to rank a round port of that width, labelled an assumption, or
 * the solved least area under the variant's width profile to rank that.
 */
export function breathingSummary(variant: Variant, units: Units, options: BreathingOptions = {}): BreathingSummary | null {
  const b = variant.parts ? partsBreathing(variant.parts, units, options) : null;
  if (!b) return null;
  return {
    valveDiameter: b.valveDiameter,
    lift: b.lift,
    ld: b.ld,
    curtainArea: b.curtainArea,
    minValveArea: b.minValveArea,
    stage: b.stage,
    throatArea: b.throatArea,
    throatPct: b.throatPct,
    port: b.port,
    greatest: b.greatest,
    crossoverLift: b.crossoverLift,
  };
}
