/** Where the flow is likely to leave each wall: the boundary-layer march run on the wall speeds in absolute units. */
import { marchWall, type WallMarch } from '../boundary-layer/march.ts';
import { offWallStretch } from '../boundary-layer/off-wall.ts';
import type { ReadingSettings } from './options.ts';
import type { WallPath } from './wall-paths.ts';
import type { DetachmentMethod, WallDetachmentReading, WallPoint } from './types.ts';

/** What a wall hands on to the wall that continues it downstream. */
interface LayerHandOver {
  /** momentum thickness at the wall's downstream end, m */
  readonly thetaM: number;
  readonly turbulent: boolean;
}

/**
 * Marches the boundary layer along every wall from its upstream end. A wall whose upstream end is the downstream
 * end of another wall (the short side after the floor, the bowl after the short side) starts with the momentum
 * thickness and state the layer had there, so the layer grows along the whole run of walls as it does in the port;
 * its shape factor restarts at the turbulent flat-plate value. After a wall where the flow left, and on a wall with
 * no wall upstream, the next wall starts fresh (settings.start, with the march's equivalent flat-plate run ahead).
 * A path that starts where the flow divides on an island starts laminar with zero thickness: the layer is born there.
 * Results come in the order of `paths`.
 */
export function wallDetachments(paths: readonly WallPath[], settings: ReadingSettings): WallDetachmentReading[] {
  const upstreamOf = paths.map((path) => paths.findIndex((other) => other !== path && joins(other.samples, path.samples)));
  const readings: (WallDetachmentReading | undefined)[] = [];
  const handOvers: (LayerHandOver | null)[] = [];
  const visit = (k: number, depth: number): void => {
    if (readings[k] !== undefined) return;
    const up = upstreamOf[k];
    // depth guards against walls joined end to end in a ring, which falling potential rules out but odd input could make
    if (up >= 0 && depth < paths.length) visit(up, depth + 1);
    const { reading, handOver } = wallDetachment(paths[k], settings, up >= 0 ? handOvers[up] ?? null : null);
    readings[k] = reading;
    handOvers[k] = handOver;
  };
  paths.forEach((_, k) => visit(k, 0));
  return readings as WallDetachmentReading[];
}

/** True when `downstream` starts where `upstream` ends. */
function joins(upstream: Float64Array, downstream: Float64Array): boolean {
  const last = upstream.length - 4;
  return upstream[last] === downstream[0] && upstream[last + 1] === downstream[1];
}

/**
 * Marches one wall. Speeds become m/s through the flow scale (speed ratio x settings.inletMeanSpeedMs) and arc
 * lengths metres through settings.metresPerUnit; positions come back in document units from the upstream end.
 * The detachment is the earlier of the march's own (Thwaites or Head's H limit) and Stratford's point: Head answers
 * slowly to a sharp pressure rise just past a speed peak (the short side's case), which is what Stratford's
 * criterion was made for; Stratford tends to be a little early, so the reading errs towards warning.
 * Samples with no speed (NaN: no solved cell beside the wall) are left out. Throws BoundaryLayerInputError only for
 * settings out of range.
 */
export function wallDetachment(
  path: WallPath, settings: ReadingSettings, carried: LayerHandOver | null = null,
): { reading: WallDetachmentReading; handOver: LayerHandOver | null } {
  const wall = usableSamples(path.samples);
  if (wall.s.length < 2) return { reading: { name: path.name, detachment: null, stratford: null, offWall: [] }, handOver: null };
  const sM = wall.s.map((s) => s * settings.metresPerUnit);
  const speedMs = wall.ratio.map((u) => u * settings.inletMeanSpeedMs);
  const start = path.fromStagnation ? 'laminar' : carried ? (carried.turbulent ? 'turbulent' : 'laminar') : settings.start;
  const march = marchWall({
    sM, speedMs, nuM2s: settings.kinematicViscosityM2s, start, shapeFactorLimit: settings.shapeFactorLimit,
    initialThetaM: path.fromStagnation ? 0 : carried?.thetaM,
    initialRunM: path.fromStagnation ? 0 : undefined,
  });
  const first = firstDetachment(march, sM);
  const toPoint = (atM: number): WallPoint => pointAt(wall, atM / settings.metresPerUnit);
  const detachment = first ? { ...toPoint(first.sM), method: first.method, shapeFactor: first.shapeFactor } : null;
  let offWall = march.offWall;
  if (first && first.method === 'stratford') offWall = offWallStretch(sM, speedMs, first.sM, first.index, new Uint8Array(sM.length));
  const turbulent = start === 'turbulent' || march.transitionSM !== null;
  return {
    reading: {
      name: path.name,
      detachment,
      stratford: march.stratford ? toPoint(march.stratford.sM) : null,
      offWall: stretches(wall.s, offWall, detachment?.s ?? Infinity),
    },
    handOver: detachment ? null : { thetaM: march.theta[march.theta.length - 1], turbulent },
  };
}

/** The earlier of the march's detachment and Stratford's point, with the first sample at or after it. */
function firstDetachment(march: WallMarch, sM: Float64Array): { sM: number; index: number; method: DetachmentMethod; shapeFactor: number } | null {
  const own = march.detachment;
  const stratford = march.stratford;
  if (stratford && (!own || stratford.sM < own.sM)) {
    let index = 0;
    while (index < sM.length - 1 && sM[index] < stratford.sM) index++;
    return { sM: stratford.sM, index, method: 'stratford', shapeFactor: march.shapeFactor[index] };
  }
  return own ? { sM: own.sM, index: own.index, method: own.method, shapeFactor: own.shapeFactor } : null;
}

/** Samples with a finite speed and a strictly increasing arc length, as columns (document units). */
interface WallColumns {
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly s: Float64Array;
  readonly ratio: Float64Array;
}

function usableSamples(samples: Float64Array): WallColumns {
  const keep: number[] = [];
  for (let q = 0; q < samples.length / 4; q++) {
    if (!Number.isFinite(samples[4 * q + 3]) || samples[4 * q + 3] < 0) continue;
    if (keep.length > 0 && !(samples[4 * q + 2] > samples[4 * keep[keep.length - 1] + 2])) continue;
    keep.push(q);
  }
  const column = (offset: number) => Float64Array.from(keep, (q) => samples[4 * q + offset]);
  return { x: column(0), y: column(1), s: column(2), ratio: column(3) };
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
