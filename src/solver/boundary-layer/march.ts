/** The march along one wall: laminar (Thwaites, Michel) and turbulent (Head, Stratford) to find where flow leaves it. */

import { BoundaryLayerInputError } from './errors.ts';
import { TURBULENT_START_SHAPE_FACTOR, turbulentEquivalentRun, turbulentFlatPlateTheta } from './head-closure.ts';
import { marchTurbulent } from './head-march.ts';
import { marchLaminar } from './laminar-march.ts';
import { stratfordSeparation } from './stratford.ts';
import { thwaitesFlatPlateTheta, thwaitesShapeFactor } from './thwaites.ts';
import { checkSetting, checkWallSamples } from './wall-samples.ts';
import { STALL_SHARE, prepareWallFlow, type WallFlow } from './wall-flow.ts';
import { offWallStretch } from './off-wall.ts';

/** Detachment limit on Head's H; separation is commonly taken between 2.2 and 2.4. */
export const DEFAULT_SHAPE_FACTOR_LIMIT = 2.4;
/**
 * Equivalent flat-plate run ahead of the wall's first sample, m: a short stretch of manifold runner ahead of the
 * port face. It sets the starting momentum thickness (and Michel's Re_x) unless initialThetaM is given.
 */
export const DEFAULT_INITIAL_RUN_M = 0.05;

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
 * or a setting is out of range.
 */
export function marchWall(input: WallMarchInput): WallMarch {
  const settings = readSettings(input);
  const { sM, speedMs, nuM2s } = input;
  checkWallSamples(sM, speedMs);
  const n = sM.length;
  const theta = new Float64Array(n);
  const shapeFactor = new Float64Array(n);
  const offWall = new Uint8Array(n);
  const quiet = { detachment: null, transitionSM: null, stratford: null, theta, shapeFactor, offWall };
  if (n === 0) return quiet;
  const wall = prepareWallFlow(sM, speedMs, nuM2s);
  if (!(wall.topSpeedMs > 0)) {
    theta.fill(input.initialThetaM ?? 0);
    shapeFactor.fill(settings.laminar ? thwaitesShapeFactor(0) : TURBULENT_START_SHAPE_FACTOR);
    return quiet;
  }
  const layer = settings.laminar ? laminarThenTurbulent(wall, input, settings, theta, shapeFactor) : turbulentOnly(wall, input, settings, theta, shapeFactor);
  let detachment: WallDetachment | null = null;
  if (layer.detached) {
    const { sM: at, method, shapeFactor: h } = layer.detached;
    const index = firstAtOrAfter(sM, at);
    detachment = { sM: at, index, method, shapeFactor: h };
    theta.fill(layer.detached.thetaM, layer.lastIndex + 1);
    shapeFactor.fill(layer.detached.shapeFactor, layer.lastIndex + 1);
    offWallStretch(sM, speedMs, detachment.sM, index, offWall);
  }
  const stratford = layer.turbulentFrom === null ? null : stratfordOpinion(wall, theta, layer.turbulentFrom);
  return { detachment, transitionSM: layer.transitionSM, stratford, theta, shapeFactor, offWall };
}

interface Settings {
  readonly laminar: boolean;
  readonly shapeFactorLimit: number;
  readonly initialRunM: number;
}

function readSettings(input: WallMarchInput): Settings {
  checkSetting('air kinematic viscosity (m²/s)', input.nuM2s, 1e-9, 1);
  const shapeFactorLimit = input.shapeFactorLimit ?? DEFAULT_SHAPE_FACTOR_LIMIT;
  checkSetting('detachment shape factor', shapeFactorLimit, 1.5, 4);
  const initialRunM = input.initialRunM ?? DEFAULT_INITIAL_RUN_M;
  checkSetting('run ahead of the wall (m)', initialRunM, 0, 100);
  if (input.initialThetaM !== undefined) checkSetting('starting momentum thickness (m)', input.initialThetaM, 0, 1);
  const start = input.start ?? 'turbulent';
  if (start !== 'turbulent' && start !== 'laminar') {
    throw new BoundaryLayerInputError('bad-setting', `The layer can start 'turbulent' or 'laminar', not '${String(start)}'.`);
  }
  return { laminar: start === 'laminar', shapeFactorLimit, initialRunM };
}

/** How the layer went: where it detached (if it did), the last sample written by a march, where it turned turbulent. */
interface LayerOutcome {
  readonly detached: { sM: number; thetaM: number; shapeFactor: number; method: 'thwaites' | 'head' } | null;
  readonly lastIndex: number;
  readonly transitionSM: number | null;
  /** first sample on the turbulent stretch, or null when there is none */
  readonly turbulentFrom: number | null;
}

function turbulentOnly(wall: WallFlow, input: WallMarchInput, settings: Settings, theta: Float64Array, shape: Float64Array): LayerOutcome {
  const u0 = Math.max(wall.speedMs[0], STALL_SHARE * wall.topSpeedMs);
  const theta0 = input.initialThetaM ?? turbulentFlatPlateTheta(settings.initialRunM, u0, wall.nuM2s);
  const start = { sM: wall.sM[0], thetaM: theta0, shapeFactor: TURBULENT_START_SHAPE_FACTOR };
  return headFrom(wall, start, settings, theta, shape, null);
}

/**
 * Laminar from the first sample (Thwaites); at Michel transition theta carries over and H is reset to the turbulent
 * flat-plate value 1.4 (common practice), then Head. A wall that starts at a stagnation point (speed below 1% of its
 * top speed) counts Michel's Re_x from there, not from the run ahead.
 */
function laminarThenTurbulent(wall: WallFlow, input: WallMarchInput, settings: Settings, theta: Float64Array, shape: Float64Array): LayerOutcome {
  const u0 = wall.speedMs[0];
  const stagnationStart = u0 < STALL_SHARE * wall.topSpeedMs;
  const runM = stagnationStart ? 0 : settings.initialRunM;
  const theta0 = input.initialThetaM ?? thwaitesFlatPlateTheta(settings.initialRunM, u0, wall.nuM2s);
  const run = marchLaminar(wall, { thetaM: theta0, runM }, theta, shape);
  const { end } = run;
  if (end.kind === 'wall-end') return { detached: null, lastIndex: run.lastIndex, transitionSM: null, turbulentFrom: null };
  if (end.kind !== 'transition') {
    const detached = { sM: end.sM, thetaM: end.thetaM, shapeFactor: end.shapeFactor, method: 'thwaites' as const };
    return { detached, lastIndex: run.lastIndex, transitionSM: null, turbulentFrom: null };
  }
  const start = { sM: end.sM, thetaM: end.thetaM, shapeFactor: TURBULENT_START_SHAPE_FACTOR };
  return headFrom(wall, start, settings, theta, shape, end.sM);
}

function headFrom(
  wall: WallFlow,
  start: { sM: number; thetaM: number; shapeFactor: number },
  settings: Settings,
  theta: Float64Array,
  shape: Float64Array,
  transitionSM: number | null,
): LayerOutcome {
  const run = marchTurbulent(wall, start, theta, shape, settings.shapeFactorLimit);
  const detached = run.kind === 'wall-end' ? null : { sM: run.sM, thetaM: run.thetaM, shapeFactor: run.shapeFactor, method: 'head' as const };
  return { detached, lastIndex: run.lastIndex, transitionSM, turbulentFrom: firstAtOrAfter(wall.sM, start.sM) };
}

/** Stratford on the turbulent stretch; the equivalent run at each sample comes from its marched theta. */
function stratfordOpinion(wall: WallFlow, theta: Float64Array, from: number): { sM: number } | null {
  const run = new Float64Array(wall.sM.length);
  for (let i = from; i < run.length; i++) {
    run[i] = turbulentEquivalentRun(theta[i], Math.max(wall.speedMs[i], wall.floorMs), wall.nuM2s);
  }
  return stratfordSeparation(wall.sM, wall.speedMs, wall.nuM2s, run, from);
}

/** First sample index with sM[i] >= s (the last sample when s is past the end). */
function firstAtOrAfter(sM: Float64Array, s: number): number {
  let i = 0;
  while (i < sM.length - 1 && sM[i] < s) i++;
  return i;
}
