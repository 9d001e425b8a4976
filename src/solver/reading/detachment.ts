/** Where the flow is likely to leave each wall: the boundary-layer march run wall after wall down the port. */
import type { ReadingSettings } from './options.ts';
import type { WallPath } from './wall-paths.ts';
import type { WallDetachmentReading } from './types.ts';
import { marchStretch, usableSamples, type LayerStart } from './wall-layer.ts';

/** What a wall hands on to the wall that continues it downstream. */
export type LayerHandOver =
  | { readonly kind: 'on'; readonly thetaM: number; readonly turbulent: boolean }
  /** the flow left upstream and is still off: it comes back where the speed first rises past speedMs (m/s) */
  | { readonly kind: 'off'; readonly speedMs: number };

/**
 * Marches the boundary layer along every wall from its upstream end, in the order of `paths`. A wall whose upstream
 * end is the downstream end of another wall (the short side after the floor, the bowl after the short side) goes on
 * from the state the layer had there: with its momentum thickness (the shape factor restarts at the turbulent
 * flat-plate value), or, when the flow left upstream and is still off, off the wall until the speed rises past the
 * speed where it left (then a fresh layer starts). Other walls start fresh; see marchStretch.
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
 * One wall, given the layer handed on from upstream (null: none). Samples with no speed (NaN: no solved cell beside
 * the wall) are left out. Throws BoundaryLayerInputError only for settings out of range.
 */
export function wallDetachment(
  path: WallPath, settings: ReadingSettings, carried: LayerHandOver | null = null,
): { reading: WallDetachmentReading; handOver: LayerHandOver | null } {
  const wall = usableSamples(path.samples);
  const n = wall.s.length;
  const quiet = { name: path.name, detachment: null, stratford: null };
  if (n < 2) return { reading: { ...quiet, offWall: [] }, handOver: null };
  let from = 0;
  const offBefore: [number, number][] = [];
  if (carried?.kind === 'off') {
    while (from < n && !(wall.ratio[from] * settings.inletMeanSpeedMs > carried.speedMs)) from++;
    if (from > 0) offBefore.push([wall.s[0], wall.s[from - 1]]);
    if (n - from < 2) return { reading: { ...quiet, offWall: [[wall.s[0], wall.s[n - 1]]] }, handOver: from === n ? carried : null };
  }
  const start: LayerStart = path.fromStagnation ? { kind: 'born' }
    : carried?.kind === 'on' ? { kind: 'carried', thetaM: carried.thetaM, turbulent: carried.turbulent }
    : { kind: 'fresh' };
  const stretch = marchStretch(wall, from, start, settings);
  const handOver: LayerHandOver | null = !stretch.detachment ? { kind: 'on', thetaM: stretch.thetaEndM, turbulent: stretch.turbulentEnd }
    : stretch.offAtEnd ? { kind: 'off', speedMs: stretch.detachmentSpeedMs! }
    : null;
  const reading = { name: path.name, detachment: stretch.detachment, stratford: stretch.stratford, offWall: [...offBefore, ...stretch.offWall] };
  return { reading, handOver };
}
