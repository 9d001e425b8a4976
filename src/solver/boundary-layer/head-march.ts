/** Turbulent stretch of a wall: Head's entrainment method, integrated with RK4 between the samples. */

import {
  headEntrainment,
  headH1,
  headShapeFactor,
  ludwiegTillmannCf,
} from './head-closure.ts';
import { stallCrossing, type WallFlow } from './wall-flow.ts';
import { firstSampleAtOrAfter } from './wall-samples.ts';

/** Re_theta below which Ludwieg–Tillmann is not trusted: a floor for cf and the starting theta (numerical guard). */
const MIN_TURBULENT_RE_THETA = 100;
/** Largest step in momentum thicknesses: keeps RK4 stable where H1 relaxes fastest (near separation, ~0.04/theta). */
const STEP_PER_THETA = 10;
/** Largest step as a share of U / |dU/ds|. */
const STEP_PER_SPEED_SCALE = 0.1;
/** Smallest step as a share of the wall length, so a wall never costs more than ~1e4 steps. */
const MIN_STEP_SHARE = 1e-4;

export interface TurbulentStart {
  /** arc length where the turbulent layer starts, m (at or after the first sample) */
  readonly sM: number;
  readonly thetaM: number;
  readonly shapeFactor: number;
}

export interface TurbulentRun {
  /** detachment: H reached the limit; stall: edge speed fell to ~0; wall-end: attached to the end */
  readonly kind: 'detachment' | 'stall' | 'wall-end';
  /** arc length of the end, m */
  readonly sM: number;
  readonly thetaM: number;
  readonly shapeFactor: number;
  /** last sample written */
  readonly lastIndex: number;
}

/**
 * What Head's method integrates: z = ln(theta / 1 m) and Y = U theta H1 (m^2/s). Marching ln(theta) keeps theta
 * positive even where a step must be longer than RK4's stable length (within micrometres of a stagnation point),
 * because the stiff pressure-gradient term -(H + 2) dU/ds / U does not depend on theta in this form.
 */
interface State {
  z: number;
  y: number;
}

/** theta is kept between these, m, so exp(z) never underflows or overflows (only reached at absurd inputs). */
const LN_THETA_MIN = Math.log(1e-15);
const LN_THETA_MAX = Math.log(1e6);

function thetaOf(state: State): number {
  return Math.exp(Math.min(Math.max(state.z, LN_THETA_MIN), LN_THETA_MAX));
}

/**
 * Marches Head's method from `start` to the end of the wall (or detachment), writing theta (m) and H at every
 * sample at or after start.sM. U and dU/ds are interpolated linearly inside each sample segment.
 */
export function marchTurbulent(
  wall: WallFlow,
  start: TurbulentStart,
  thetaM: Float64Array,
  shapeFactor: Float64Array,
  shapeFactorLimit: number,
): TurbulentRun {
  const { sM } = wall;
  const n = sM.length;
  const minStep = MIN_STEP_SHARE * (sM[n - 1] - sM[0]);
  const thetaFloor = (MIN_TURBULENT_RE_THETA * wall.nuM2s) / Math.max(wall.topSpeedMs, wall.floorMs);
  let s = start.sM;
  let i = firstSampleAtOrAfter(sM, s);
  const k0 = Math.max(i - 1, 0);
  const theta0 = Math.max(start.thetaM, thetaFloor);
  let state: State = { z: Math.log(theta0), y: speedAt(wall, k0, s) * theta0 * headH1(start.shapeFactor) };
  if (sM[i] === s) {
    thetaM[i] = theta0;
    shapeFactor[i] = start.shapeFactor;
    i++;
  }
  for (; i < n; i++) {
    const stall = stallCrossing(wall, i);
    const target = stall === null ? sM[i] : Math.max(stall, s);
    const leg = integrateLeg(wall, i - 1, s, target, state, shapeFactorLimit, minStep);
    if (leg.detachedAt !== null) return { kind: 'detachment', ...leg.detachedAt, lastIndex: i - 1 };
    state = leg.state;
    s = target;
    const h = shapeFactorOf(wall, i - 1, s, state);
    if (stall !== null) return { kind: 'stall', sM: s, thetaM: thetaOf(state), shapeFactor: h, lastIndex: i - 1 };
    thetaM[i] = thetaOf(state);
    shapeFactor[i] = h;
  }
  return { kind: 'wall-end', sM: sM[n - 1], thetaM: thetaM[n - 1], shapeFactor: shapeFactor[n - 1], lastIndex: n - 1 };
}

interface Leg {
  state: State;
  detachedAt: { sM: number; thetaM: number; shapeFactor: number } | null;
}

/** RK4 from s to target inside segment k, stopping where H reaches the limit (linear in s within the step). */
function integrateLeg(
  wall: WallFlow,
  k: number,
  from: number,
  target: number,
  start: State,
  limit: number,
  minStep: number,
): Leg {
  let s = from;
  let state = start;
  let h0 = shapeFactorOf(wall, k, s, state);
  while (s < target) {
    const u = speedAt(wall, k, s);
    const g = Math.abs(gradientAt(wall, k, s));
    const scale = g > 0 ? (STEP_PER_SPEED_SCALE * u) / g : Infinity;
    let step = Math.min(target - s, Math.max(Math.min(STEP_PER_THETA * thetaOf(state), scale), minStep));
    if (s + step <= s) step = target - s; // far from s = 0 a tiny step could round away: finish the leg instead
    const next = rk4Step(wall, k, s, step, state);
    const sNext = step === target - s ? target : s + step;
    const finite = Number.isFinite(next.z) && Number.isFinite(next.y);
    const h1 = finite ? shapeFactorOf(wall, k, sNext, next) : Infinity;
    if (h1 >= limit) {
      const t = Number.isFinite(h1) && h1 > h0 ? Math.min(Math.max((limit - h0) / (h1 - h0), 0), 1) : 0;
      const theta = finite ? thetaOf(state) + t * (thetaOf(next) - thetaOf(state)) : thetaOf(state);
      return { state, detachedAt: { sM: s + t * (sNext - s), thetaM: theta, shapeFactor: limit } };
    }
    state = next;
    s = sNext;
    h0 = h1;
  }
  return { state, detachedAt: null };
}

function rk4Step(wall: WallFlow, k: number, s: number, h: number, y0: State): State {
  const a = rates(wall, k, s, y0);
  const b = rates(wall, k, s + h / 2, { z: y0.z + (h / 2) * a.z, y: y0.y + (h / 2) * a.y });
  const c = rates(wall, k, s + h / 2, { z: y0.z + (h / 2) * b.z, y: y0.y + (h / 2) * b.y });
  const d = rates(wall, k, s + h, { z: y0.z + h * c.z, y: y0.y + h * c.y });
  const z = y0.z + (h / 6) * (a.z + 2 * b.z + 2 * c.z + d.z);
  return {
    z: Math.min(Math.max(z, LN_THETA_MIN), LN_THETA_MAX),
    y: y0.y + (h / 6) * (a.y + 2 * b.y + 2 * c.y + d.y),
  };
}

/**
 * Head's equations: d theta/ds = cf/2 - (H + 2) (theta/U) dU/ds, written for ln(theta), and dY/ds = U F(H1)
 * with Y = U theta H1; cf from Ludwieg–Tillmann with Re_theta floored at MIN_TURBULENT_RE_THETA.
 */
function rates(wall: WallFlow, k: number, s: number, state: State): State {
  const u = speedAt(wall, k, s);
  const theta = thetaOf(state);
  const h1 = state.y / (u * theta);
  const h = headShapeFactor(h1);
  const reTheta = Math.max((u * theta) / wall.nuM2s, MIN_TURBULENT_RE_THETA);
  const cf = ludwiegTillmannCf(h, reTheta);
  return {
    z: cf / (2 * theta) - ((h + 2) * gradientAt(wall, k, s)) / u,
    y: u * headEntrainment(h1),
  };
}

function shapeFactorOf(wall: WallFlow, k: number, s: number, state: State): number {
  return headShapeFactor(state.y / (speedAt(wall, k, s) * thetaOf(state)));
}

/** Edge speed at s in segment k (linear), raised to the floor, m/s. */
function speedAt(wall: WallFlow, k: number, s: number): number {
  return Math.max(lerp(wall.sM, wall.speedMs, k, s), wall.floorMs);
}

/** dU/ds at s in segment k, linear between the sample gradients, 1/s. */
function gradientAt(wall: WallFlow, k: number, s: number): number {
  return lerp(wall.sM, wall.gradientPerS, k, s);
}

function lerp(sM: Float64Array, v: Float64Array, k: number, s: number): number {
  if (sM.length < 2) return v[0];
  const t = (s - sM[k]) / (sM[k + 1] - sM[k]);
  return v[k] + t * (v[k + 1] - v[k]);
}
