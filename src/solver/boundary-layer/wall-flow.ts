/** The prepared wall the laminar and turbulent marches share: samples, speed gradient and guard speeds. */

import { speedGradient } from './wall-samples.ts';

/** Below this share of the wall's top speed, 1/U terms use the share instead (keeps them finite). */
const SPEED_FLOOR_SHARE = 1e-3;
/** A wall whose top speed is below this, m/s, is in still air: no layer is marched. */
export const STILL_AIR_MS = 1e-6;
/** Edge speed falling to this share of the highest speed upstream means the flow has stalled at the wall. */
export const STALL_SHARE = 0.01;

export interface WallFlow {
  /** arc length, m, strictly increasing, one per sample */
  readonly sM: Float64Array;
  /** edge speed, m/s, >= 0, one per sample */
  readonly speedMs: Float64Array;
  /** dU/ds at each sample, 1/s (three-point differences) */
  readonly gradientPerS: Float64Array;
  /** highest edge speed at or upstream of each sample, m/s */
  readonly peakSoFarMs: Float64Array;
  /** kinematic viscosity, m^2/s */
  readonly nuM2s: number;
  /** speed floor for 1/U terms, m/s (> 0) */
  readonly floorMs: number;
  /** highest edge speed on the wall, m/s */
  readonly topSpeedMs: number;
}

/** Prepares checked samples for marching. */
export function prepareWallFlow(sM: Float64Array, speedMs: Float64Array, nuM2s: number): WallFlow {
  const peakSoFarMs = new Float64Array(speedMs.length);
  let peak = 0;
  for (let i = 0; i < speedMs.length; i++) {
    peak = Math.max(peak, speedMs[i]);
    peakSoFarMs[i] = peak;
  }
  const floorMs = Math.max(SPEED_FLOOR_SHARE * peak, Number.MIN_VALUE);
  return { sM, speedMs, gradientPerS: speedGradient(sM, speedMs), peakSoFarMs, nuM2s, floorMs, topSpeedMs: peak };
}

/**
 * Where the flow stalls in the segment ending at sample i: the edge speed falls to STALL_SHARE of the highest speed
 * upstream. Returns the arc length (m) of that crossing, or null when sample i is not stalled.
 */
export function stallCrossing(wall: WallFlow, i: number): number | null {
  if (i < 1) return null;
  const limit = STALL_SHARE * wall.peakSoFarMs[i - 1];
  const u0 = wall.speedMs[i - 1];
  const u1 = wall.speedMs[i];
  if (!(limit > 0) || u1 > limit || u0 <= limit) return null;
  const t = (u0 - limit) / (u0 - u1);
  return wall.sM[i - 1] + t * (wall.sM[i] - wall.sM[i - 1]);
}
