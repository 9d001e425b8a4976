/** Runs the layer along a prepared wall: turbulent from the start, or laminar then turbulent after transition. */

import { TURBULENT_START_SHAPE_FACTOR, turbulentFlatPlateTheta } from './head-closure.ts';
import { marchTurbulent, type TurbulentStart } from './head-march.ts';
import { marchLaminar } from './laminar-march.ts';
import { thwaitesFlatPlateTheta } from './thwaites.ts';
import { STALL_SHARE, type WallFlow } from './wall-flow.ts';
import { firstSampleAtOrAfter } from './wall-samples.ts';

export interface LayerSettings {
  readonly laminar: boolean;
  readonly shapeFactorLimit: number;
  /** equivalent flat-plate run ahead of the first sample, m */
  readonly initialRunM: number;
  /** momentum thickness at the first sample, m, when the caller knows it */
  readonly initialThetaM: number | undefined;
}

/** Per-sample outputs the marches write into: theta (m) and shape factor H. */
export interface LayerArrays {
  readonly theta: Float64Array;
  readonly shapeFactor: Float64Array;
}

/** How the layer went. */
export interface LayerOutcome {
  /** where it left the wall, or null */
  readonly detached: { sM: number; thetaM: number; shapeFactor: number; method: 'thwaites' | 'head' } | null;
  /** last sample a march wrote; later samples are downstream of detachment */
  readonly lastIndex: number;
  /** arc length of Michel transition, m, or null */
  readonly transitionSM: number | null;
  /** first sample on the turbulent stretch, or null when there is none */
  readonly turbulentFrom: number | null;
}

export function runLayer(wall: WallFlow, settings: LayerSettings, out: LayerArrays): LayerOutcome {
  return settings.laminar ? laminarThenTurbulent(wall, settings, out) : turbulentOnly(wall, settings, out);
}

/**
 * Turbulent from the first sample. Starting theta: a turbulent flat plate of the run ahead at the first sample's
 * speed (at least 1% of the wall's top speed, so a stagnation start still gets a finite layer).
 */
function turbulentOnly(wall: WallFlow, settings: LayerSettings, out: LayerArrays): LayerOutcome {
  const u0 = Math.max(wall.speedMs[0], STALL_SHARE * wall.topSpeedMs);
  const theta0 = settings.initialThetaM ?? turbulentFlatPlateTheta(settings.initialRunM, u0, wall.nuM2s);
  const start = { sM: wall.sM[0], thetaM: theta0, shapeFactor: TURBULENT_START_SHAPE_FACTOR };
  return headFrom(wall, start, settings, out, null);
}

/**
 * Laminar from the first sample (Thwaites); at Michel transition theta carries over and H is reset to the turbulent
 * flat-plate value 1.4 (common practice), then Head. A wall that starts at a stagnation point (speed below 1% of its
 * top speed) has no run ahead: the layer starts there (Hiemenz limit) and Michel's Re_x counts from there.
 */
function laminarThenTurbulent(wall: WallFlow, settings: LayerSettings, out: LayerArrays): LayerOutcome {
  const u0 = wall.speedMs[0];
  const runM = u0 < STALL_SHARE * wall.topSpeedMs ? 0 : settings.initialRunM;
  const theta0 = settings.initialThetaM ?? thwaitesFlatPlateTheta(runM, u0, wall.nuM2s);
  const { lastIndex, end } = marchLaminar(wall, { thetaM: theta0, runM }, out.theta, out.shapeFactor);
  if (end.kind === 'wall-end') return { detached: null, lastIndex, transitionSM: null, turbulentFrom: null };
  if (end.kind !== 'transition') {
    const detached = { sM: end.sM, thetaM: end.thetaM, shapeFactor: end.shapeFactor, method: 'thwaites' as const };
    return { detached, lastIndex, transitionSM: null, turbulentFrom: null };
  }
  const start = { sM: end.sM, thetaM: end.thetaM, shapeFactor: TURBULENT_START_SHAPE_FACTOR };
  return headFrom(wall, start, settings, out, end.sM);
}

function headFrom(
  wall: WallFlow,
  start: TurbulentStart,
  settings: LayerSettings,
  out: LayerArrays,
  transitionSM: number | null,
): LayerOutcome {
  const run = marchTurbulent(wall, start, out.theta, out.shapeFactor, settings.shapeFactorLimit);
  const detached =
    run.kind === 'wall-end'
      ? null
      : { sM: run.sM, thetaM: run.thetaM, shapeFactor: run.shapeFactor, method: 'head' as const };
  return { detached, lastIndex: run.lastIndex, transitionSM, turbulentFrom: firstSampleAtOrAfter(wall.sM, start.sM) };
}
