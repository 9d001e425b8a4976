/** Flow domains and checks shared by the solver's accuracy tests. */
import { expect } from 'vitest';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../src/solver/types.ts';
import type { FlowDomain, WallSpeeds } from '../../src/solver/types.ts';
import { domainOf, ringOf, type Pt } from './rasterise/shapes.ts';

/** |actual / expected - 1| <= tolerance, with both numbers in the failure message. */
export function expectRelative(actual: number, expected: number, tolerance: number): void {
  const error = Math.abs(actual / expected - 1);
  expect(error, `${actual} vs ${expected}: relative error ${error.toExponential(2)} > ${tolerance}`).toBeLessThanOrEqual(tolerance);
}

/**
 * Cylinder of diameter 1 centred in a channel of width 1 / dOverH, reaching `lengthsEachSide` widths
 * upstream and downstream: inlet at the left end, outlet at the right, cylinder wall named "cylinder"
 * (clockwise ring of `segments` chords, fluid outside).
 */
export function cylinderInChannel(dOverH: number, lengthsEachSide: number, segments = 2048): FlowDomain {
  const width = 1 / dOverH;
  const half = lengthsEachSide * width;
  const outer = ringOf(
    [[-half, -width / 2], [half, -width / 2], [half, width / 2], [-half, width / 2]],
    [MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_INLET], [0, -1, 0, -1],
  );
  const pts: Pt[] = [];
  for (let k = 0; k < segments; k++) {
    const t = (-2 * Math.PI * k) / segments;
    pts.push([0.5 * Math.cos(t), 0.5 * Math.sin(t)]);
  }
  const island = ringOf(pts, undefined, new Array<number>(segments).fill(1));
  return domainOf(outer, [island], ['channel wall', 'cylinder']);
}

export function wallNamed(walls: readonly WallSpeeds[], name: string): WallSpeeds {
  const found = walls.find((w) => w.name === name);
  if (!found) throw new Error(`no wall named ${name}: ${walls.map((w) => w.name).join(', ')}`);
  return found;
}

/** Largest speed ratio of a wall's samples. */
export function wallPeak(w: WallSpeeds): number {
  let peak = 0;
  for (let q = 3; q < w.samples.length; q += 4) peak = Math.max(peak, w.samples[q]);
  return peak;
}

/** Mean speed ratio of a wall's samples whose polar angle about the origin lies in [from, to] radians. */
export function meanWallRatio(w: WallSpeeds, from: number, to: number): number {
  let sum = 0;
  let count = 0;
  for (let q = 0; q < w.samples.length; q += 4) {
    const angle = Math.atan2(w.samples[q + 1], w.samples[q]);
    if (angle < from || angle > to) continue;
    sum += w.samples[q + 3];
    count++;
  }
  return sum / count;
}

/** Observed order of convergence from errors at successive halvings of the cell size. */
export function observedOrders(errors: readonly number[]): number[] {
  return errors.slice(1).map((e, k) => Math.log2(Math.abs(errors[k]) / Math.abs(e)));
}
