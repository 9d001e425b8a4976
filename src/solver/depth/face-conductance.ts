/** Face conductances with a passage depth: open fraction times the depth at the face midpoint. */
import type { GridFrame } from '../rasterise/frame.ts';
import type { DepthAt } from './depth-model.ts';

/** Depth at a point in grid units (u = (x - x0) / h, v = (y - y0) / h), length units out. */
export type GridDepthAt = (u: number, v: number) => number;

/** The depth of `depth` read in grid units of `frame`. */
export function gridDepth(depth: DepthAt, frame: GridFrame): GridDepthAt {
  const { x0, y0, h } = frame;
  return (u, v) => depth(x0 + u * h, y0 + v * h);
}

/**
 * conductanceX[f] = openX[f] * b(face midpoint) and likewise for y; faces that are shut stay 0 and are not
 * evaluated. Layouts as CutGrid.openX ((nx + 1) * ny, i + j * (nx + 1), midpoint (i, j + 1/2) in grid units) and
 * openY (nx * (ny + 1), i + m * nx, midpoint (i + 1/2, m)). A face on an axisymmetric axis gets 0: nothing divides by it.
 */
export function faceConductances(
  frame: GridFrame, openX: Float64Array, openY: Float64Array, depth: GridDepthAt,
): { conductanceX: Float64Array; conductanceY: Float64Array } {
  const { nx, ny } = frame;
  const conductanceX = new Float64Array(openX.length);
  const conductanceY = new Float64Array(openY.length);
  for (let j = 0; j < ny; j++) {
    for (let i = 0, f = j * (nx + 1); i <= nx; i++, f++) if (openX[f] !== 0) conductanceX[f] = openX[f] * depth(i, j + 0.5);
  }
  for (let m = 0; m <= ny; m++) {
    for (let i = 0, f = m * nx; i < nx; i++, f++) if (openY[f] !== 0) conductanceY[f] = openY[f] * depth(i + 0.5, m);
  }
  return { conductanceX, conductanceY };
}
