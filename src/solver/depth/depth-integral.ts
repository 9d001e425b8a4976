/** Depth integrated along lines: the area of an inlet, an outlet or a station (length times depth), exact for both depth kinds. */
import { axisNormal, depthFunction } from './depth-model.ts';
import { FlowSetupError } from '../errors.ts';
import { markedLength, sumOverMarked } from '../rasterise/checks.ts';
import { MARK_INLET, MARK_OUTLET, type DepthModel, type FlowDomain } from '../types.ts';

/**
 * The integral of b along the segment (ax, ay) -> (bx, by), length units squared (length times depth).
 * Exact: the axisymmetric depth is linear along a segment on one side of the axis (split where it crosses); the
 * sampled depth is quadratic along a segment between lattice lines (split at each), where Simpson's rule is exact.
 * Example: axis along x through the origin, segment (0, 0) -> (0, R): pi R^2.
 */
export function segmentDepthIntegral(model: DepthModel, ax: number, ay: number, bx: number, by: number): number {
  const length = Math.hypot(bx - ax, by - ay);
  if (length === 0) return 0;
  if (model.kind === 'axisymmetric') {
    const axis = axisNormal(model);
    const d0 = (ax - axis.x) * axis.nx + (ay - axis.y) * axis.ny;
    const d1 = (bx - axis.x) * axis.nx + (by - axis.y) * axis.ny;
    const mean = d0 * d1 >= 0 ? 0.5 * Math.abs(d0 + d1) : (0.5 * (d0 * d0 + d1 * d1)) / Math.abs(d1 - d0);
    return 2 * Math.PI * mean * length;
  }
  const depth = depthFunction(model);
  const cuts = [0, 1, ...latticeCuts(ax, bx, model.x0, model.dx, model.nx), ...latticeCuts(ay, by, model.y0, model.dy, model.ny)];
  cuts.sort((p, q) => p - q);
  let sum = 0;
  for (let k = 1; k < cuts.length; k++) {
    const t0 = cuts[k - 1];
    const t1 = cuts[k];
    if (t1 <= t0) continue;
    const tm = 0.5 * (t0 + t1);
    const at = (t: number) => depth(ax + t * (bx - ax), ay + t * (by - ay));
    sum += ((t1 - t0) / 6) * (at(t0) + 4 * at(tm) + at(t1));
  }
  return sum * length;
}

/** Parameters t in (0, 1) where a - > b crosses the lattice lines origin + k step, k = 0 .. count - 1. */
function latticeCuts(a: number, b: number, origin: number, step: number, count: number): number[] {
  if (a === b) return [];
  const lo = Math.max(0, Math.ceil((Math.min(a, b) - origin) / step));
  const hi = Math.min(count - 1, Math.floor((Math.max(a, b) - origin) / step));
  const out: number[] = [];
  for (let k = lo; k <= hi; k++) {
    const t = (origin + k * step - a) / (b - a);
    if (t > 0 && t < 1) out.push(t);
  }
  return out;
}

/** Integral of b over every segment of every ring that carries `mark` (the inlet's or outlet's area), length units squared. */
export function markedDepthIntegral(domain: FlowDomain, model: DepthModel, mark: number): number {
  return sumOverMarked(domain, mark, (x0, y0, x1, y1) => segmentDepthIntegral(model, x0, y0, x1, y1));
}

/** Integral of b along polylines (x0, y0, x1, y1, ... document units): a station's area. */
export function linesDepthIntegral(model: DepthModel, lines: readonly Float64Array[]): number {
  let sum = 0;
  for (const xy of lines) for (let k = 0; k + 3 < xy.length; k += 2) sum += segmentDepthIntegral(model, xy[k], xy[k + 1], xy[k + 2], xy[k + 3]);
  return sum;
}

/**
 * With a depth, the inlet and the outlet must each have an area; one that lies on the axis of a round section has
 * none (b = 0 there) and carries no flow. Throws FlowSetupError naming which.
 */
export function checkEndAreas(domain: FlowDomain): void {
  if (domain.depth === undefined) return;
  for (const [mark, name] of [[MARK_INLET, 'inlet'], [MARK_OUTLET, 'outlet']] as const) {
    if (!(markedDepthIntegral(domain, domain.depth, mark) > 0)) {
      throw new FlowSetupError('depth', `The ${name} has no area: it lies where the passage has no width (on the axis of a round section).`);
    }
  }
}

/**
 * What the mean inlet speed divides the inlet flux by: the inlet's length without a depth, its area (integral of b
 * along it, length units squared) with one. Throws FlowSetupError when a depth leaves the inlet no area.
 */
export function inletSize(domain: FlowDomain): number {
  if (domain.depth === undefined) return markedLength(domain, MARK_INLET);
  const area = markedDepthIntegral(domain, domain.depth, MARK_INLET);
  if (!(area > 0)) {
    throw new FlowSetupError('depth', 'The inlet has no area: it lies where the passage has no width (on the axis of a round section).');
  }
  return area;
}
