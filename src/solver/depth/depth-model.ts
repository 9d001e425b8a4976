/** Passage depth b(x, y) normal to the section: evaluating a DepthModel, and the checks a depth must pass before a solve. */
import { FlowSetupError, formatLength } from '../errors.ts';
import type { AxisymmetricDepth, DepthModel, FlowDomain, SampledDepth } from '../types.ts';

/** Depth at a point, length units in and out. */
export type DepthAt = (x: number, y: number) => number;

/** The depth of a model as a function of (x, y) in domain coordinates. */
export function depthFunction(model: DepthModel): DepthAt {
  return model.kind === 'axisymmetric' ? axisymmetricDepth(model) : sampledDepth(model);
}

/** Unit normal (nx, ny) of the axis line and a point on it: signed distance = (p - point) . normal. */
export function axisNormal(model: AxisymmetricDepth): { x: number; y: number; nx: number; ny: number } {
  const { x, y, dirX, dirY } = model.axis;
  const length = Math.hypot(dirX, dirY);
  return { x, y, nx: -dirY / length, ny: dirX / length };
}

/** b = 2 pi r, r the distance from the axis line. Example: axis along x through the origin, b(3, 2) = 4 pi. */
function axisymmetricDepth(model: AxisymmetricDepth): DepthAt {
  const { x, y, nx, ny } = axisNormal(model);
  const twoPi = 2 * Math.PI;
  return (px, py) => twoPi * Math.abs((px - x) * nx + (py - y) * ny);
}

/** Bilinear between lattice nodes, held at the edge value beyond the lattice. */
function sampledDepth(model: SampledDepth): DepthAt {
  const { x0, y0, dx, dy, nx, ny, values } = model;
  return (px, py) => {
    const u = Math.min(Math.max((px - x0) / dx, 0), nx - 1);
    const v = Math.min(Math.max((py - y0) / dy, 0), ny - 1);
    const i = Math.min(Math.floor(u), Math.max(nx - 2, 0));
    const j = Math.min(Math.floor(v), Math.max(ny - 2, 0));
    const fu = u - i;
    const fv = v - j;
    const i1 = Math.min(i + 1, nx - 1);
    const j1 = Math.min(j + 1, ny - 1);
    const below = values[i + j * nx] + fu * (values[i1 + j * nx] - values[i + j * nx]);
    const above = values[i + j1 * nx] + fu * (values[i1 + j1 * nx] - values[i + j1 * nx]);
    return below + fv * (above - below);
  };
}

/**
 * Checks the domain's depth, if it has one. A depth the porter can get wrong (a width of zero or less, a round
 * section that crosses its axis) throws FlowSetupError; a malformed lattice or axis (a caller bug) throws RangeError.
 */
export function checkDepth(domain: FlowDomain): void {
  const model = domain.depth;
  if (model === undefined) return;
  if (model.kind === 'axisymmetric') checkAxisymmetric(domain, model);
  else if (model.kind === 'sampled') checkSampled(model);
  else throw new RangeError(`unknown depth kind ${(model as { kind: unknown }).kind}`);
}

function checkAxisymmetric(domain: FlowDomain, model: AxisymmetricDepth): void {
  const { x, y, dirX, dirY } = model.axis;
  if (![x, y, dirX, dirY].every(Number.isFinite) || Math.hypot(dirX, dirY) === 0) {
    throw new RangeError(`axisymmetric depth: the axis needs a finite point and a direction, got ${JSON.stringify(model.axis)}`);
  }
  const axis = axisNormal(model);
  let below: [number, number] | null = null;
  let above: [number, number] | null = null;
  let reach = 0;
  const rings = [domain.outer, ...domain.islands];
  for (const ring of rings) for (let k = 0; k < ring.xy.length; k += 2) reach = Math.max(reach, Math.hypot(ring.xy[k] - x, ring.xy[k + 1] - y));
  const tolerance = 1e-9 * reach;
  for (const ring of rings) {
    for (let k = 0; k < ring.xy.length; k += 2) {
      const d = (ring.xy[k] - axis.x) * axis.nx + (ring.xy[k + 1] - axis.y) * axis.ny;
      if (d < -tolerance) below ??= [ring.xy[k], ring.xy[k + 1]];
      if (d > tolerance) above ??= [ring.xy[k], ring.xy[k + 1]];
    }
  }
  if (below !== null && above !== null) {
    throw new FlowSetupError(
      'depth',
      'The section crosses the axis it turns about. A round (axisymmetric) section must lie on one side of its axis.',
      below,
    );
  }
}

function checkSampled(model: SampledDepth): void {
  const { x0, y0, dx, dy, nx, ny, values } = model;
  if (![x0, y0].every(Number.isFinite) || !(dx > 0 && dy > 0 && Number.isFinite(dx) && Number.isFinite(dy))) {
    throw new RangeError(`sampled depth: lattice origin must be finite and spacing positive, got ${x0}, ${y0}, ${dx}, ${dy}`);
  }
  if (!(Number.isInteger(nx) && Number.isInteger(ny) && nx >= 1 && ny >= 1) || values.length !== nx * ny) {
    throw new RangeError(`sampled depth: ${nx} x ${ny} nodes but ${values.length} values`);
  }
  for (let k = 0; k < values.length; k++) {
    const b = values[k];
    if (Number.isFinite(b) && b > 0) continue;
    const at: [number, number] = [x0 + (k % nx) * dx, y0 + Math.floor(k / nx) * dy];
    const step = Math.min(dx, dy) / 10;
    const value = Number.isFinite(b) ? formatLength(b, step) : 'not a number';
    throw new FlowSetupError(
      'depth',
      `The passage width is ${value} at (${formatLength(at[0], step)}, ${formatLength(at[1], step)}). Every width along the port must be more than zero.`,
      at,
    );
  }
}
