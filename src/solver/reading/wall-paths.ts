/** Wall speed samples put in downstream order (falling potential), closed island walls split at their upstream point. */
import type { CutGrid, WallSpeeds } from '../types.ts';
import { sampleCells } from './field.ts';

/** One wall read downstream. */
export interface WallPath {
  readonly name: string;
  /** Name of the wall (run of samples) the path comes from; differs from `name` only for a split closed wall. */
  readonly wall: string;
  /** x, y, s (from the upstream end, document units), speed ratio; 4 numbers a sample, downstream order */
  readonly samples: Float64Array;
  /** True when the path starts where the flow divides on an island (a stagnation point): its layer is born there. */
  readonly fromStagnation: boolean;
  /** Potential at the upstream end. */
  readonly upstreamPhi: number;
}

/**
 * Orients every wall so that it runs downstream. An open wall is reversed when its last sample has the higher
 * potential. A closed wall (an island with one name, first sample repeated at the end) has no single downstream
 * direction: the flow meets it at its highest potential and leaves at its lowest, so it becomes two paths between
 * those points, named "<name>, left of the flow" and "<name>, right of the flow" (left and right as seen looking
 * from the upstream point towards the downstream one).
 * @param phi extended cell potential (see extendedPhi), row-major i + j * nx
 */
export function downstreamWalls(walls: readonly WallSpeeds[], grid: CutGrid, phi: Float64Array): WallPath[] {
  const out: WallPath[] = [];
  for (const wall of walls) {
    const count = wall.samples.length / 4;
    if (count < 2) continue;
    const potential = new Float64Array(count);
    for (let q = 0; q < count; q++) potential[q] = sampleCells(grid, phi, wall.samples[4 * q], wall.samples[4 * q + 1]);
    if (isClosed(wall.samples) && count >= 4) out.push(...splitClosed(wall, potential));
    else {
      const flip = potential[count - 1] > potential[0];
      const samples = flip ? reorder(wall.samples, range(count - 1, 0)) : wall.samples;
      out.push({ name: wall.name, wall: wall.name, samples, fromStagnation: false, upstreamPhi: flip ? potential[count - 1] : potential[0] });
    }
  }
  return out;
}

function isClosed(samples: Float64Array): boolean {
  const last = samples.length - 4;
  return samples[0] === samples[last] && samples[1] === samples[last + 1];
}

/** Two paths from the highest-potential sample to the lowest, one each way round the ring. */
function splitClosed(wall: WallSpeeds, potential: Float64Array): WallPath[] {
  const cyc = potential.length - 1;
  let top = 0, bottom = 0;
  for (let q = 0; q < cyc; q++) {
    if (potential[q] > potential[top]) top = q;
    if (potential[q] < potential[bottom]) bottom = q;
  }
  if (top === bottom) return [{ name: wall.name, wall: wall.name, samples: wall.samples, fromStagnation: false, upstreamPhi: potential[0] }];
  // indices unrolled over two turns of the ring, so a path may run past sample 0
  const forward = range(top, bottom > top ? bottom : bottom + cyc);
  const backward = range(top + cyc, bottom < top ? bottom + cyc : bottom);
  const s = wall.samples;
  const dx = s[4 * bottom] - s[4 * top], dy = s[4 * bottom + 1] - s[4 * top + 1];
  // how far a path bulges to the left of the line from the upstream to the downstream point (mean cross product)
  const leftward = (path: number[]): number =>
    path.reduce((sum, u) => sum + dx * (s[4 * (u % cyc) + 1] - s[4 * top + 1]) - dy * (s[4 * (u % cyc)] - s[4 * top]), 0) / path.length;
  const forwardLeft = leftward(forward) >= leftward(backward);
  return [forward, backward].map((path, k) => ({
    name: `${wall.name}, ${(k === 0) === forwardLeft ? 'left' : 'right'} of the flow`,
    wall: wall.name,
    samples: reorder(s, path, cyc),
    fromStagnation: true,
    upstreamPhi: potential[top],
  }));
}

/** Consecutive integers from a to b inclusive, counting down when b < a. */
function range(a: number, b: number): number[] {
  const step = b >= a ? 1 : -1;
  return Array.from({ length: Math.abs(b - a) + 1 }, (_, k) => a + k * step);
}

/**
 * The samples at the given indices, with s recomputed as the arc length walked from the first of them.
 * For a closed wall of `cyc` distinct samples, indices may run up to 2 cyc (two turns): index u is sample u mod cyc
 * at arc length s(u mod cyc) + floor(u / cyc) * (the ring's length).
 */
function reorder(samples: Float64Array, order: readonly number[], cyc = Infinity): Float64Array {
  const out = new Float64Array(4 * order.length);
  const turn = Number.isFinite(cyc) ? samples[4 * cyc + 2] : 0;
  const arc = (u: number): number => samples[4 * (u % cyc) + 2] + Math.floor(u / cyc) * turn;
  order.forEach((u, k) => {
    const q = u % cyc;
    out[4 * k] = samples[4 * q];
    out[4 * k + 1] = samples[4 * q + 1];
    out[4 * k + 2] = Math.abs(arc(u) - arc(order[0]));
    out[4 * k + 3] = samples[4 * q + 3];
  });
  return out;
}
