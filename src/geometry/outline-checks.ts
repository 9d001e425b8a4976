/** Checks on an outline before flattening: enough vertices, one edge per vertex, finite numbers, no zero-length edge. */

import type { Outline, Point } from '../document/types.ts';
import { GeometryError, capitalise, outlineLabel } from './errors.ts';

/**
 * Throws GeometryError 'bad-outline' or 'zero-length'.
 * An edge counts as zero-length when its ends are within 1e-6 of the chordal tolerance `tol`:
 * far below anything the flattening can show, so only a corner dropped on its neighbour trips it.
 */
export function checkOutlineShape(outline: Outline, tol: number, islandName?: string): void {
  const { vertices, edges } = outline;
  const label = outlineLabel(islandName);
  const n = vertices.length;
  if (n < 3) throw new GeometryError('bad-outline', `${capitalise(label)} needs at least 3 corners; it has ${n}.`, { islandName });
  if (edges.length !== n) {
    throw new GeometryError('bad-outline', `${capitalise(label)} has ${n} corners but ${edges.length} edges; it needs one edge per corner.`, { islandName });
  }
  for (let i = 0; i < n; i++) {
    const v = vertices[i];
    const edge = edges[i];
    const extra: readonly Point[] = edge.kind === 'arc' ? [edge.through] : edge.kind === 'curve' ? edge.via : [];
    const radius = v.filletRadius ?? 0;
    if (!finitePoint(v.at) || !extra.every(finitePoint) || !Number.isFinite(radius) || radius < 0) {
      throw new GeometryError('bad-outline',
        `Corner ${i + 1} or edge ${i + 1} of ${label} has a missing or impossible number (position or fillet radius).`,
        { vertexIndex: i, edgeIndex: i, islandName });
    }
  }
  const near = 1e-6 * tol;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const a = vertices[i].at, b = vertices[j].at;
    if (Math.abs(a[0] - b[0]) <= near && Math.abs(a[1] - b[1]) <= near) {
      throw new GeometryError('zero-length',
        `Corners ${i + 1} and ${j + 1} of ${label} are at the same place, so edge ${i + 1} has no length; move or delete one of them.`,
        { where: a, vertexIndex: i, edgeIndex: i, islandName });
    }
  }
}

function finitePoint(p: Point): boolean {
  return Array.isArray(p) && p.length === 2 && Number.isFinite(p[0]) && Number.isFinite(p[1]);
}
