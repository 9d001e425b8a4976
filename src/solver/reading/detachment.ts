/** Where the flow is likely to leave each wall: the boundary-layer march run on the wall speeds in absolute units. */
import { marchWall } from '../boundary-layer/march.ts';
import type { ReadingSettings } from './options.ts';
import type { WallPath } from './wall-paths.ts';
import type { WallDetachmentReading, WallPoint } from './types.ts';

/**
 * Marches the boundary layer from the wall's upstream end. Speeds become m/s through the flow scale
 * (speed ratio x settings.inletMeanSpeedMs) and arc lengths metres through settings.metresPerUnit; positions come
 * back in document units, measured from the upstream end. Samples with no speed (NaN: no solved cell beside the
 * wall) are left out. Throws BoundaryLayerInputError only for settings out of range.
 */
export function wallDetachment(path: WallPath, settings: ReadingSettings): WallDetachmentReading {
  const wall = usableSamples(path.samples);
  const none = { name: path.name, detachment: null, stratford: null, offWall: [] };
  if (wall.s.length < 2) return none;
  const march = marchWall({
    sM: wall.s.map((s) => s * settings.metresPerUnit),
    speedMs: wall.ratio.map((u) => u * settings.inletMeanSpeedMs),
    nuM2s: settings.kinematicViscosityM2s,
    start: settings.start,
    shapeFactorLimit: settings.shapeFactorLimit,
  });
  const toPoint = (sM: number): WallPoint => pointAt(wall, sM / settings.metresPerUnit);
  const detachment = march.detachment
    ? { ...toPoint(march.detachment.sM), method: march.detachment.method, shapeFactor: march.detachment.shapeFactor }
    : null;
  const stratford = march.stratford ? toPoint(march.stratford.sM) : null;
  return { name: path.name, detachment, stratford, offWall: stretches(wall.s, march.offWall, detachment?.s ?? Infinity) };
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
