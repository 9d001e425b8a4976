/** Flow domains with a passage depth for the depth tests, built through the solver's own domain types. */
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../../src/solver/types.ts';
import type { FlowDomain, SampledDepth } from '../../../src/solver/types.ts';
import { channel, domainOf, ringOf, type Pt } from '../rasterise/shapes.ts';

/** Axis along x through the origin: b = 2 pi y above it. */
export const X_AXIS = { kind: 'axisymmetric', axis: { x: 0, y: 0, dirX: 1, dirY: 0 } } as const;

/** A depth that varies along x only, sampled at `count` nodes from x = 0 to x = lengthL. */
export function depthAlongX(lengthL: number, count: number, depth: (x: number) => number): SampledDepth {
  const dx = lengthL / (count - 1);
  return { kind: 'sampled', x0: 0, y0: 0, dx, dy: 1, nx: count, ny: 1, values: Float64Array.from({ length: count }, (_, i) => depth(i * dx)) };
}

/** The straight channel [0, L] x [0, W] (inlet x = 0, outlet x = L) with a depth. */
export function channelWithDepth(lengthL: number, widthW: number, depth: FlowDomain['depth']): FlowDomain {
  return { ...channel(lengthL, widthW), depth };
}

/**
 * Round pipe of radius R and length L about the x axis: the half-section [0, L] x [0, R] with the axis as its lower
 * wall ("axis"), the pipe wall above ("pipe wall"), inlet at x = 0 and outlet at x = L.
 */
export function roundPipe(lengthL: number, radiusR: number): FlowDomain {
  const pts: Pt[] = [[0, 0], [lengthL, 0], [lengthL, radiusR], [0, radiusR]];
  return { ...domainOf(ringOf(pts, [MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_INLET], [0, -1, 1, -1]), [], ['axis', 'pipe wall']), depth: X_AXIS };
}

/**
 * Sphere of radius a centred at the origin on the axis of a round pipe of radius R, the pipe reaching `reach` each
 * way: the half-section above the x axis, the sphere's half circle in `segments` chords (wall "sphere"), the axis
 * on both sides of it ("axis"), inlet at x = -reach, outlet at x = reach.
 */
export function sphereInPipe(radiusA: number, radiusR: number, reach: number, segments = 1024): FlowDomain {
  const pts: Pt[] = [[-reach, 0]];
  const marks: number[] = [MARK_WALL];
  const ids: number[] = [0];
  for (let k = 0; k < segments; k++) {
    const t = Math.PI - (Math.PI * k) / segments;
    pts.push([radiusA * Math.cos(t), radiusA * Math.sin(t)]);
    marks.push(MARK_WALL);
    ids.push(1);
  }
  pts.push([radiusA, 0], [reach, 0], [reach, radiusR], [-reach, radiusR]);
  marks.push(MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_INLET);
  ids.push(0, -1, 2, -1);
  return { ...domainOf(ringOf(pts, marks, ids), [], ['axis', 'sphere', 'pipe wall']), depth: X_AXIS };
}
