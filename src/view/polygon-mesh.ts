/** Triangles filling a polygon with holes (ear clipping by three's ShapeUtils), as flat typed arrays for a mesh. */

import { ShapeUtils, Vector2 } from 'three';
import type { Polyline } from './types.ts';

export interface Triangles {
  /** x, y, z per vertex (z = 0), section units. */
  readonly positions: Float32Array;
  /** Three vertex indices per triangle. */
  readonly indices: Uint32Array;
}

/** Ring points, dropping a repeated closing point (earcut wants each corner once). */
function ringPoints(ring: Polyline): Vector2[] {
  const pts: Vector2[] = [];
  for (let k = 0; k + 1 < ring.xy.length; k += 2) pts.push(new Vector2(ring.xy[k], ring.xy[k + 1]));
  if (pts.length > 1 && pts[0].equals(pts[pts.length - 1])) pts.pop();
  return pts;
}

/** Triangulate `outer` less `holes`; either winding is accepted. Degenerate rings (< 3 points) give no triangles. */
export function polygonTriangles(outer: Polyline, holes: readonly Polyline[]): Triangles {
  const contour = ringPoints(outer);
  if (contour.length < 3) return { positions: new Float32Array(0), indices: new Uint32Array(0) };
  const holePts = holes.map(ringPoints).filter((h) => h.length >= 3);
  const faces = ShapeUtils.triangulateShape(contour, holePts);
  const all = contour.concat(...holePts);
  const positions = new Float32Array(all.length * 3);
  all.forEach((p, k) => {
    positions[3 * k] = p.x;
    positions[3 * k + 1] = p.y;
  });
  const indices = new Uint32Array(faces.length * 3);
  faces.forEach((f, k) => indices.set(f, 3 * k));
  return { positions, indices };
}
