/** Small hand-made flow domains for the rasteriser, connectivity and wall-speed tests. */
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../../src/solver/types.ts';
import type { CutGrid, FlowDomain, Ring } from '../../../src/solver/types.ts';

export type Pt = readonly [number, number];

/** A ring from points; marks and wall ids default to unnamed walls. */
export function ringOf(points: readonly Pt[], marks?: readonly number[], wallIds?: readonly number[]): Ring {
  const n = points.length;
  return {
    xy: Float64Array.from(points.flat()),
    marks: Uint8Array.from(marks ?? new Array<number>(n).fill(MARK_WALL)),
    wallIds: Int32Array.from(wallIds ?? new Array<number>(n).fill(-1)),
  };
}

export function domainOf(outer: Ring, islands: readonly Ring[] = [], wallNames: readonly string[] = []): FlowDomain {
  return { outer, islands, wallNames };
}

/** Shoelace area of a point list (positive counter-clockwise). */
export function polygonArea(points: readonly Pt[]): number {
  let sum = 0;
  for (let k = 0; k < points.length; k++) {
    const [x0, y0] = points[k];
    const [x1, y1] = points[(k + 1) % points.length];
    sum += x0 * y1 - x1 * y0;
  }
  return sum / 2;
}

/** Fluid area the rasteriser measured: sum of cell fractions times h^2, length units squared. */
export function fluidArea(grid: CutGrid): number {
  let sum = 0;
  for (const f of grid.cellFraction) sum += f;
  return sum * grid.h * grid.h;
}

/**
 * Straight channel [0, L] x [0, W]: inlet on x = 0, outlet on x = L, "floor" below and "roof" above.
 * Counter-clockwise from (0, 0): floor, outlet, roof, inlet.
 */
export function channel(lengthL: number, widthW: number): FlowDomain {
  const pts: Pt[] = [[0, 0], [lengthL, 0], [lengthL, widthW], [0, widthW]];
  return domainOf(ringOf(pts, [MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_INLET], [0, -1, 1, -1]), [], ['floor', 'roof']);
}

/**
 * Concentric 90 degree bend, r1 < r < r2, theta from 0 to pi/2, centre at the origin, arcs cut in `arcSegments` chords.
 * Inlet on theta = 0 (y = 0), outlet on theta = pi/2 (x = 0); walls "long side" (outer arc) and "short side" (inner arc).
 */
export function bend(r1: number, r2: number, arcSegments: number): FlowDomain {
  const pts: Pt[] = [];
  const marks: number[] = [];
  const ids: number[] = [];
  pts.push([r1, 0]);
  marks.push(MARK_INLET);
  ids.push(-1);
  for (let k = 0; k < arcSegments; k++) {
    const t = (k / arcSegments) * (Math.PI / 2);
    pts.push([r2 * Math.cos(t), r2 * Math.sin(t)]);
    marks.push(MARK_WALL);
    ids.push(0);
  }
  pts.push([0, r2]);
  marks.push(MARK_OUTLET);
  ids.push(-1);
  for (let k = 0; k < arcSegments; k++) {
    const t = (1 - k / arcSegments) * (Math.PI / 2);
    pts.push([r1 * Math.cos(t), r1 * Math.sin(t)]);
    marks.push(MARK_WALL);
    ids.push(1);
  }
  return domainOf(ringOf(pts, marks, ids), [], ['long side', 'short side']);
}

/**
 * An invented intake port section (mm): inlet on x = 0 (y 40..80), a floor with a 20 mm short-side radius,
 * a roof on a 60 mm radius, the port opening onto the deck (y = 0) between x = 60 and x = 100, and a test bore
 * 90 wide and 60 deep below with the outlet at its far end (the deck underside and bore sides are "bore wall"). The valve head is an island: a 50 mm wide
 * disc section, 3 mm thick, its face at y = `valveFaceY` (0 = shut on the deck edges), chamfered below.
 */
export function portSection(valveFaceY: number, arcSegments = 60): FlowDomain {
  const pts: Pt[] = [];
  const marks: number[] = [];
  const ids: number[] = [];
  const add = (p: Pt, mark: number, id: number) => {
    pts.push(p);
    marks.push(mark);
    ids.push(id);
  };
  add([0, 40], MARK_WALL, 0);
  for (let k = 0; k < arcSegments; k++) {
    const t = Math.PI / 2 - (k / arcSegments) * (Math.PI / 2);
    add([40 + 20 * Math.cos(t), 20 + 20 * Math.sin(t)], MARK_WALL, 1);
  }
  add([60, 20], MARK_WALL, 2);
  add([60, 0], MARK_WALL, 3);
  add([30, 0], MARK_WALL, 3);
  add([30, -60], MARK_OUTLET, -1);
  add([120, -60], MARK_WALL, 3);
  add([120, 0], MARK_WALL, 3);
  add([100, 0], MARK_WALL, 4);
  for (let k = 0; k < 2 * arcSegments; k++) {
    const t = (k / (2 * arcSegments)) * (Math.PI / 2);
    add([40 + 60 * Math.cos(t), 20 + 60 * Math.sin(t)], MARK_WALL, 4);
  }
  add([40, 80], MARK_WALL, 4);
  add([0, 80], MARK_INLET, -1);
  const y = valveFaceY;
  // Clockwise, as islands are.
  const valve: Pt[] = [[55, y], [105, y], [105, y - 1.5], [102, y - 3], [58, y - 3], [55, y - 1.5]];
  const names = ['floor', 'short side', 'throat', 'bore wall', 'roof', 'valve head'];
  return domainOf(ringOf(pts, marks, ids), [ringOf(valve, undefined, valve.map(() => 5))], names);
}
