/** The boundary-layer march on one stretch of wall, in the reading's units: where the layer leaves and where it is off. */
import { marchWall, type WallMarch } from '../boundary-layer/march.ts';
import { offWallStretch, speedAtArc } from '../boundary-layer/off-wall.ts';
import { firstSampleAtOrAfter } from '../boundary-layer/wall-samples.ts';
import type { ReadingSettings } from './options.ts';
import type { DetachmentMethod, WallDetachmentReading, WallPoint } from './types.ts';

/** Wall samples with a finite speed and a strictly increasing arc length, as columns (document units). */
export interface WallColumns {
  readonly x: Float64Array;
  readonly y: Float64Array;
  /** arc length from the wall's upstream end, document units */
  readonly s: Float64Array;
  readonly ratio: Float64Array;
}

/** The state of the layer where a stretch begins. */
export type LayerStart =
  | { readonly kind: 'fresh' }
  | { readonly kind: 'born' }
  | { readonly kind: 'carried'; readonly thetaM: number; readonly turbulent: boolean };

/** A marched stretch: what the reading reports, plus what the next wall needs. */
export interface MarchedStretch {
  readonly detachment: WallDetachmentReading['detachment'];
  readonly stratford: WallPoint | null;
  readonly offWall: [number, number][];
  /** momentum thickness at the last sample, m (its value at detachment when the layer left) */
  readonly thetaEndM: number;
  readonly turbulentEnd: boolean;
  /** edge speed where the layer left, m/s; the flow stays off until the speed rises past it */
  readonly detachmentSpeedMs: number | null;
  /** the flow is off the wall at the last sample */
  readonly offAtEnd: boolean;
}

/**
 * Marches samples `from` .. end. Speeds become m/s through the flow scale (ratio x settings.inletMeanSpeedMs), arc
 * lengths metres through settings.metresPerUnit; results are in document units from the wall's upstream end.
 * The detachment is the earlier of the march's own (Thwaites, or Head's H limit) and Stratford's point: Head answers
 * slowly to a sharp pressure rise just past a speed peak (the short side's case), which is what Stratford's criterion
 * was made for; Stratford tends to be a little early, so the reading errs towards warning.
 * Start: 'fresh' = settings.start with the march's equivalent flat-plate run ahead; 'born' = laminar from zero
 * thickness (a layer that starts where the flow divides on an island); 'carried' = the layer handed on from upstream.
 */
export function marchStretch(wall: WallColumns, from: number, start: LayerStart, settings: ReadingSettings): MarchedStretch {
  const n = wall.s.length - from;
  const sM = new Float64Array(n);
  const speedMs = new Float64Array(n);
  for (let q = 0; q < n; q++) {
    sM[q] = wall.s[from + q] * settings.metresPerUnit;
    speedMs[q] = wall.ratio[from + q] * settings.inletMeanSpeedMs;
  }
  const state = start.kind === 'born' ? 'laminar' : start.kind === 'carried' ? (start.turbulent ? 'turbulent' : 'laminar') : settings.start;
  const march = marchWall({
    sM, speedMs, nuM2s: settings.kinematicViscosityM2s, start: state, shapeFactorLimit: settings.shapeFactorLimit,
    initialThetaM: start.kind === 'born' ? 0 : start.kind === 'carried' ? start.thetaM : undefined,
    initialRunM: start.kind === 'born' ? 0 : undefined,
  });
  const first = firstDetachment(march, sM);
  const toPoint = (atM: number): WallPoint => pointAt(wall, atM / settings.metresPerUnit);
  let off = march.offWall;
  if (first && first.method === 'stratford') off = offWallStretch(sM, speedMs, first.sM, first.index, new Uint8Array(sM.length));
  const detachment = first ? { ...toPoint(first.sM), method: first.method, shapeFactor: first.shapeFactor } : null;
  return {
    detachment,
    stratford: march.stratford ? toPoint(march.stratford.sM) : null,
    offWall: stretches(wall.s.subarray(from), off, detachment?.s ?? Infinity),
    thetaEndM: march.theta[march.theta.length - 1],
    turbulentEnd: state === 'turbulent' || march.transitionSM !== null,
    detachmentSpeedMs: first ? speedAtArc(sM, speedMs, first.sM, first.index) : null,
    offAtEnd: off[off.length - 1] === 1,
  };
}

/** The earlier of the march's detachment and Stratford's point, with the first sample at or after it. */
function firstDetachment(march: WallMarch, sM: Float64Array): { sM: number; index: number; method: DetachmentMethod; shapeFactor: number } | null {
  const own = march.detachment;
  const stratford = march.stratford;
  if (stratford && (!own || stratford.sM < own.sM)) {
    const index = firstSampleAtOrAfter(sM, stratford.sM);
    return { sM: stratford.sM, index, method: 'stratford', shapeFactor: march.shapeFactor[index] };
  }
  return own ? { sM: own.sM, index: own.index, method: own.method, shapeFactor: own.shapeFactor } : null;
}

/** Samples of a wall path (x, y, s, ratio; 4 a sample) with a finite speed >= 0 and a strictly increasing arc length. */
export function usableSamples(samples: Float64Array): WallColumns {
  const keep: number[] = [];
  for (let q = 0; q < samples.length / 4; q++) {
    if (!Number.isFinite(samples[4 * q + 3]) || samples[4 * q + 3] < 0) continue;
    if (keep.length > 0 && !(samples[4 * q + 2] > samples[4 * keep[keep.length - 1] + 2])) continue;
    keep.push(q);
  }
  const columns = [0, 1, 2, 3].map(() => new Float64Array(keep.length));
  for (let k = 0; k < keep.length; k++) for (let offset = 0; offset < 4; offset++) columns[offset][k] = samples[4 * keep[k] + offset];
  return { x: columns[0], y: columns[1], s: columns[2], ratio: columns[3] };
}

/** The point at arc length s along the samples (linear between them, clamped to the ends). */
function pointAt(wall: WallColumns, s: number): WallPoint {
  const n = wall.s.length;
  let k = 0;
  while (k < n - 2 && wall.s[k + 1] < s) k++;
  const t = Math.min(1, Math.max(0, (s - wall.s[k]) / (wall.s[k + 1] - wall.s[k])));
  return { s, x: wall.x[k] + t * (wall.x[k + 1] - wall.x[k]), y: wall.y[k] + t * (wall.y[k + 1] - wall.y[k]) };
}

/** Runs of marked samples as [sStart, sEnd]; a run holding the detachment starts at the detachment itself. */
function stretches(s: Float64Array, marked: Uint8Array, detachmentS: number): [number, number][] {
  const out: [number, number][] = [];
  for (let q = 0; q < marked.length; q++) {
    if (!marked[q]) continue;
    const first = q;
    while (q + 1 < marked.length && marked[q + 1]) q++;
    const start = first > 0 && s[first - 1] < detachmentS && detachmentS <= s[first] ? detachmentS : s[first];
    out.push([start, s[q]]);
  }
  return out;
}
