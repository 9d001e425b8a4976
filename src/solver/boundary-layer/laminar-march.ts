/** Laminar stretch of a wall: Thwaites' method sample by sample until separation, stall or Michel transition. */

import { michelTransitionReTheta } from './michel.ts';
import {
  THWAITES_A,
  THWAITES_SEPARATION_LAMBDA,
  speedFifthIntegral,
  thwaitesShapeFactor,
  thwaitesThetaSq,
} from './thwaites.ts';
import { stallCrossing, type WallFlow } from './wall-flow.ts';

export interface LaminarEnd {
  /** separation: lambda reached the separation value; stall: edge speed fell to ~0; transition: Michel. */
  readonly kind: 'separation' | 'stall' | 'transition' | 'wall-end';
  /** arc length where the laminar stretch ends, m */
  readonly sM: number;
  /** momentum thickness there, m */
  readonly thetaM: number;
  /** laminar shape factor there */
  readonly shapeFactor: number;
}

export interface LaminarRun {
  /** last sample on the laminar stretch (-1 when it ends before the first sample is passed) */
  readonly lastIndex: number;
  readonly end: LaminarEnd;
}

export interface LaminarStart {
  /** momentum thickness at the first sample, m */
  readonly thetaM: number;
  /** distance from the layer's origin to the first sample, m (for Michel's Re_x) */
  readonly runM: number;
}

/** Per-sample laminar state, computed while marching. */
interface Station {
  numerator: number;
  lambda: number;
  transitionMargin: number;
}

/**
 * Marches Thwaites' method from the first sample. Writes theta (m) and H into `thetaM` / `shapeFactor` for every
 * sample on the laminar stretch and reports how the stretch ends.
 * @param separationLambda lambda at which the layer separates; default: where the fitted shear l is zero (-0.0898)
 * @param allowTransition false keeps the layer laminar whatever Michel says
 */
export function marchLaminar(
  wall: WallFlow,
  start: LaminarStart,
  thetaM: Float64Array,
  shapeFactor: Float64Array,
  separationLambda = THWAITES_SEPARATION_LAMBDA,
  allowTransition = true,
): LaminarRun {
  const { sM, speedMs, nuM2s } = wall;
  const n = sM.length;
  let prev: Station = { numerator: start.thetaM ** 2 * speedMs[0] ** 6, lambda: 0, transitionMargin: -Infinity };
  for (let i = 0; i < n; i++) {
    const added = i === 0 ? 0 : THWAITES_A * nuM2s * speedFifthIntegral(speedMs[i - 1], speedMs[i], sM[i] - sM[i - 1]);
    const here = station(wall, i, prev.numerator + added, start.runM, allowTransition);
    const end = firstEvent(wall, i, prev, here, separationLambda);
    if (end) return { lastIndex: i - 1, end };
    thetaM[i] = Math.sqrt(thwaitesThetaSq(here.numerator, speedMs[i], wall.gradientPerS[i], nuM2s, wall.floorMs));
    shapeFactor[i] = thwaitesShapeFactor(here.lambda);
    prev = here;
  }
  const last = n - 1;
  return {
    lastIndex: last,
    end: { kind: 'wall-end', sM: sM[last], thetaM: thetaM[last], shapeFactor: shapeFactor[last] },
  };
}

function station(wall: WallFlow, i: number, numerator: number, runM: number, allowTransition: boolean): Station {
  const { sM, speedMs, nuM2s } = wall;
  const thetaSq = thwaitesThetaSq(numerator, speedMs[i], wall.gradientPerS[i], nuM2s, wall.floorMs);
  const reTheta = (speedMs[i] * Math.sqrt(thetaSq)) / nuM2s;
  const reX = (speedMs[i] * (runM + sM[i] - sM[0])) / nuM2s;
  return {
    numerator,
    lambda: (thetaSq * wall.gradientPerS[i]) / nuM2s,
    transitionMargin: allowTransition ? reTheta - michelTransitionReTheta(reX) : -Infinity,
  };
}

/** The earliest of separation, stall and transition inside the segment ending at sample i, or null. */
function firstEvent(
  wall: WallFlow,
  i: number,
  prev: Station,
  here: Station,
  separationLambda: number,
): LaminarEnd | null {
  const s0 = i === 0 ? wall.sM[0] : wall.sM[i - 1];
  const span = i === 0 ? 0 : wall.sM[i] - s0;
  const candidates: { kind: LaminarEnd['kind']; sM: number }[] = [];
  if (here.lambda <= separationLambda) {
    const t = i === 0 ? 0 : fractionTo(prev.lambda - separationLambda, here.lambda - separationLambda);
    candidates.push({ kind: 'separation', sM: s0 + t * span });
  }
  const stall = stallCrossing(wall, i);
  if (stall !== null) candidates.push({ kind: 'stall', sM: stall });
  if (here.transitionMargin >= 0) {
    const t = i === 0 ? 0 : fractionTo(prev.transitionMargin, here.transitionMargin);
    candidates.push({ kind: 'transition', sM: s0 + t * span });
  }
  if (candidates.length === 0) return null;
  const first = candidates.reduce((a, b) => (b.sM < a.sM ? b : a));
  return endAt(wall, i, prev, first.kind, first.sM, separationLambda);
}

/** Fraction of the way from a (not yet crossed, may be -Infinity) to b (crossed) where a straight line meets 0. */
function fractionTo(a: number, b: number): number {
  if (!Number.isFinite(a) || !Number.isFinite(b) || a === b) return 1;
  return Math.min(Math.max(a / (a - b), 0), 1);
}

/** Laminar state at arc length s inside the segment ending at sample i (or at sample 0). */
function endAt(
  wall: WallFlow,
  i: number,
  prev: Station,
  kind: LaminarEnd['kind'],
  s: number,
  separationLambda: number,
): LaminarEnd {
  const { sM, speedMs, gradientPerS, nuM2s, floorMs } = wall;
  const j = Math.max(i - 1, 0);
  const t = i === 0 ? 0 : (s - sM[j]) / (sM[i] - sM[j]);
  const u = speedMs[j] + t * (speedMs[i] - speedMs[j]);
  const g = gradientPerS[j] + t * (gradientPerS[i] - gradientPerS[j]);
  const numerator =
    i === 0 ? prev.numerator : prev.numerator + THWAITES_A * nuM2s * speedFifthIntegral(speedMs[j], u, s - sM[j]);
  const thetaSq = thwaitesThetaSq(numerator, u, g, nuM2s, floorMs);
  const lambda = kind === 'separation' ? separationLambda : (thetaSq * g) / nuM2s;
  return { kind, sM: s, thetaM: Math.sqrt(thetaSq), shapeFactor: thwaitesShapeFactor(lambda) };
}
