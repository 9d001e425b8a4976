/** Walls that are lines of symmetry: along the axis of a round (axisymmetric) model the passage has no depth at all. */
import { axisNormal } from '../depth/depth-model.ts';
import type { DepthModel } from '../types.ts';

/**
 * True when every sample of `path` lies on the axis of a round model, within a hundredth of a cell (`h`): there
 * b = 2 pi r is zero, no flux crosses and no boundary layer grows, so the wall is a symmetry line, not metal. Its speed
 * is still the flow's (it is read into the field), but it is never marched, ranked or flagged.
 */
export function onSymmetryLine(path: { readonly samples: Float64Array }, depth: DepthModel | undefined, h: number): boolean {
  if (depth?.kind !== 'axisymmetric') return false;
  const { x, y, nx, ny } = axisNormal(depth);
  const { samples } = path;
  for (let q = 0; q < samples.length; q += 4) {
    if (Math.abs((samples[q] - x) * nx + (samples[q + 1] - y) * ny) > 0.01 * h) return false;
  }
  return samples.length > 0;
}
