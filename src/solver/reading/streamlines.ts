/** Streamlines from equal-flux seeds on the inlet, traced through the face-flux velocity field to the outlet. */
import { MARK_OUTLET, MARK_WALL } from '../types.ts';
import type { CutGrid, FlowDomain } from '../types.ts';
import { FaceVelocity } from './face-velocity.ts';
import type { RingIndex } from './ring-index.ts';
import { equalFluxSeeds, type Seed } from './streamline-seeds.ts';
import type { Streamline, StreamlineEnd } from './types.ts';

/** Step length, cells: half a cell keeps the midpoint rule inside one or two cells a step. */
const STEP_CELLS = 0.5;
/** Length cap, in multiples of the grid's width plus height. */
const LENGTH_CAP = 4;
/** Distance a point bumped off a wall is set back into the fluid, cells. */
const WALL_GAP = 1e-3;

/**
 * `count` streamlines, each carrying an equal share of the flux (seeded by equalFluxSeeds). Each leaves its seed
 * along the inlet's normal (the inlet is an equipotential, so the flow crosses it square-on) and is then traced with
 * the midpoint rule in steps of half a cell along the flow direction. It ends where it crosses the outlet, when it
 * cannot get off a wall or leaves the solved fluid, or after four times the grid's width plus height.
 * A step that crosses a wall slides along it instead (the wall's cut cell lets the linear field lean into it).
 * @param phi cell potential, row-major i + j * nx, NaN where not solved
 */
export function traceStreamlines(domain: FlowDomain, grid: CutGrid, phi: Float64Array, index: RingIndex, count: number): Streamline[] {
  if (count === 0) return [];
  const field = new FaceVelocity(grid, phi);
  return equalFluxSeeds(domain, grid, phi, count).map((seed) => traceOne(seed, grid, field, index));
}

function traceOne(seed: Seed, grid: CutGrid, field: FaceVelocity, index: RingIndex): Streamline {
  const ds = STEP_CELLS * grid.h;
  const maxSteps = Math.ceil((LENGTH_CAP * (grid.nx + grid.ny) * grid.h) / ds);
  const xy: number[] = [seed.x, seed.y];
  let x = seed.x + ds * seed.nx;
  let y = seed.y + ds * seed.ny;
  xy.push(x, y);
  const d1: [number, number] = [0, 0];
  const d2: [number, number] = [0, 0];
  let end: StreamlineEnd = 'length';
  for (let step = 0; step < maxSteps; step++) {
    if (!direction(field, x, y, d1)) {
      end = 'stalled';
      break;
    }
    // next to the outlet or a wall the midpoint can fall outside the solved cells: take the plain step there
    if (!direction(field, x + 0.5 * ds * d1[0], y + 0.5 * ds * d1[1], d2)) {
      d2[0] = d1[0];
      d2[1] = d1[1];
    }
    const bx = x + ds * d2[0], by = y + ds * d2[1];
    // away from the boundary the step is taken as it is (move would find no crossing)
    if (index.clearBox(x, y, bx, by)) {
      xy.push(bx, by);
      x = bx;
      y = by;
      continue;
    }
    const moved = move(index, x, y, bx, by, grid.h);
    xy.push(moved.x, moved.y);
    x = moved.x;
    y = moved.y;
    if (moved.end) {
      end = moved.end;
      break;
    }
  }
  return { xy: Float64Array.from(xy), end };
}

/** Unit flow direction at (x, y) into `out`; false where there is no field or it is still. */
function direction(field: FaceVelocity, x: number, y: number, out: [number, number]): boolean {
  if (!field.at(x, y, out)) return false;
  const speed = Math.hypot(out[0], out[1]);
  if (!(speed > 1e-300)) return false;
  out[0] /= speed;
  out[1] /= speed;
  return true;
}

/**
 * One step from (ax, ay) towards (bx, by), checked against the boundary: stops on the outlet (or the inlet, going
 * back out), slides along a wall it would cross, and gives up on a slide that crosses the boundary again.
 */
function move(index: RingIndex, ax: number, ay: number, bx: number, by: number, h: number): { x: number; y: number; end?: StreamlineEnd } {
  const hit = index.crossings(ax, ay, bx, by)[0];
  if (!hit) return { x: bx, y: by };
  const hx = ax + hit.t * (bx - ax), hy = ay + hit.t * (by - ay);
  if (hit.mark === MARK_OUTLET) return { x: hx, y: hy, end: 'outlet' };
  if (hit.mark !== MARK_WALL) return { x: hx, y: hy, end: 'wall' };
  const [nx, ny] = index.inwardNormal(hit.ring, hit.segment);
  const restX = (1 - hit.t) * (bx - ax), restY = (1 - hit.t) * (by - ay);
  const into = restX * nx + restY * ny;
  const sx = hx + WALL_GAP * h * nx, sy = hy + WALL_GAP * h * ny;
  const tx = sx + restX - into * nx, ty = sy + restY - into * ny;
  if (index.crossings(sx, sy, tx, ty).length > 0) return { x: sx, y: sy, end: 'wall' };
  return { x: tx, y: ty };
}
