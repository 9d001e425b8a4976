/** The march along one wall: laminar (Thwaites, Michel), turbulent (Head, Stratford): where does flow leave it? */

import { BoundaryLayerInputError } from './errors.ts';
import { TURBULENT_START_SHAPE_FACTOR, turbulentEquivalentRun } from './head-closure.ts';
import { runLayer, type LayerSettings } from './layer-runs.ts';
import { offWallStretch } from './off-wall.ts';
import { stratfordSeparation } from './stratford.ts';
import { thwaitesShapeFactor } from './thwaites.ts';
import { STILL_AIR_MS, prepareWallFlow, type WallFlow } from './wall-flow.ts';
import { checkSetting, checkWallSamples, firstSampleAtOrAfter } from './wall-samples.ts';

/** Detachment limit on Head's H; separation is commonly taken between 2.2 and 2.4. */
export const DEFAULT_SHAPE_FACTOR_LIMIT = 2.4;
/**
 * Equivalent flat-plate run ahead of the wall's first sample, m: a short stretch of manifold runner ahead of the
 * port face. It sets the starting momentum thickness (and Michel's Re_x) unless initialThetaM is given.
 */
const DEFAULT_INITIAL_RUN_M = 0.05;

export interface WallMarchInput {
  /** arc length, m, strictly increasing from the wall's upstream end */
  readonly sM: Float64Array;
  /** edge speed, m/s, >= 0, one per sample */
  readonly speedMs: Float64Array;
  /** kinematic viscosity, m^2/s */
  readonly nuM2s: number;
  /** state of the layer at the first sample; default 'turbulent' (manifold flow is) */
  readonly start?: 'turbulent' | 'laminar';
  /** Head's H at which the turbulent layer detaches; default 2.4; allowed 1.5..4 */
  readonly shapeFactorLimit?: number;
  /** momentum thickness at the first sample, m; default from the flat-plate run below */
  readonly initialThetaM?: number;
  /** equivalent flat-plate run before s = 0, m; default 0.05 */
  readonly initialRunM?: number;
}

export interface WallDetachment {
  /** arc length where the layer leaves the wall, m */
  readonly sM: number;
  /** first sample at or after sM */
  readonly index: number;
  /** thwaites: laminar separation (or stall) while laminar; head: turbulent detachment (or stall) */
  readonly method: 'thwaites' | 'head';
  /** shape factor H at detachment */
  readonly shapeFactor: number;
}

export interface WallMarch {
  /** first point where the layer leaves the wall, or null when it stays on to the end */
  readonly detachment: WallDetachment | null;
  /** arc length of Michel transition, m; null when the layer starts turbulent, stays laminar or separates first */
  readonly transitionSM: number | null;
  /** Stratford's turbulent separation point (second opinion), or null */
  readonly stratford: { readonly sM: number } | null;
  /** momentum thickness per sample, m; downstream of detachment it holds the value at detachment */
  readonly theta: Float64Array;
  /** shape factor H per sample; downstream of detachment it holds the value at detachment */
  readonly shapeFactor: Float64Array;
  /** per sample: 1 where flow is likely off the wall (see offWallStretch), else 0 */
  readonly offWall: Uint8Array;
}

/**
 * Marches the boundary layer along one wall. Never returns NaN for physical input; throws BoundaryLayerInputError
 * when the arrays cannot describe a wall (lengths differ, arc length not increasing, negative or non-numeric speed)
 * or a setting is out of range. A wall whose top speed is below 1 micrometre per second is still air: no layer,
 * theta = initialThetaM (or 0), H = the starting value, no detachment.
 * Example: a flat wall at 30 m/s over 1 m (nu 1.5e-5) stays attached with theta = 1.96 mm and H = 1.39 at the end.
 */
export function marchWall(input: WallMarchInput): WallMarch {
  const settings = readSettings(input);
  const { sM, speedMs, nuM2s } = input;
  checkWallSamples(sM, speedMs);
  const n = sM.length;
  const out = { theta: new Float64Array(n), shapeFactor: new Float64Array(n) };
  const offWall = new Uint8Array(n);
  const quiet = { detachment: null, transitionSM: null, stratford: null, ...out, offWall };
  if (n === 0) return quiet;
  const wall = prepareWallFlow(sM, speedMs, nuM2s);
  if (!(wall.topSpeedMs >= STILL_AIR_MS)) {
    out.theta.fill(input.initialThetaM ?? 0);
    out.shapeFactor.fill(settings.laminar ? thwaitesShapeFactor(0) : TURBULENT_START_SHAPE_FACTOR);
    return quiet;
  }
  const layer = runLayer(wall, settings, out);
  let detachment: WallDetachment | null = null;
  if (layer.detached) {
    const { sM: at, method, shapeFactor, thetaM } = layer.detached;
    detachment = { sM: at, index: firstSampleAtOrAfter(sM, at), method, shapeFactor };
    out.theta.fill(thetaM, layer.lastIndex + 1);
    out.shapeFactor.fill(shapeFactor, layer.lastIndex + 1);
    offWallStretch(sM, speedMs, at, detachment.index, offWall);
  }
  const stratford = layer.turbulentFrom === null ? null : stratfordOpinion(wall, out.theta, layer.turbulentFrom);
  return { detachment, transitionSM: layer.transitionSM, stratford, ...out, offWall };
}

function readSettings(input: WallMarchInput): LayerSettings {
  checkSetting('air kinematic viscosity (m²/s)', input.nuM2s, 1e-9, 1);
  const shapeFactorLimit = input.shapeFactorLimit ?? DEFAULT_SHAPE_FACTOR_LIMIT;
  checkSetting('detachment shape factor', shapeFactorLimit, 1.5, 4);
  const initialRunM = input.initialRunM ?? DEFAULT_INITIAL_RUN_M;
  checkSetting('run ahead of the wall (m)', initialRunM, 0, 100);
  const { initialThetaM } = input;
  if (initialThetaM !== undefined) checkSetting('starting momentum thickness (m)', initialThetaM, 0, 1);
  const start = input.start ?? 'turbulent';
  if (start !== 'turbulent' && start !== 'laminar') {
    const message = `The layer starts 'turbulent' or 'laminar', not '${String(start)}'.`;
    throw new BoundaryLayerInputError('bad-setting', message);
  }
  return { laminar: start === 'laminar', shapeFactorLimit, initialRunM, initialThetaM };
}

/** Stratford on the turbulent stretch; the equivalent run at each sample comes from its marched theta. */
function stratfordOpinion(wall: WallFlow, theta: Float64Array, from: number): { sM: number } | null {
  const run = new Float64Array(wall.sM.length);
  for (let i = from; i < run.length; i++) {
    run[i] = turbulentEquivalentRun(theta[i], Math.max(wall.speedMs[i], wall.floorMs), wall.nuM2s);
  }
  return stratfordSeparation(wall.sM, wall.speedMs, wall.nuM2s, run, from);
}
