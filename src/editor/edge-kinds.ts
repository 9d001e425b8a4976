/** Building an edge of a given kind that keeps another edge's role and wall name. */

import type { ArcEdge, CurveEdge, Edge, LineEdge, Point } from '../document/types.ts';

function roleOf(edge: Edge): Pick<Edge, 'role' | 'wallName'> {
  return edge.wallName === undefined ? { role: edge.role } : { role: edge.role, wallName: edge.wallName };
}

export function lineLike(edge: Edge): LineEdge {
  return { kind: 'line', ...roleOf(edge) };
}

export function arcLike(edge: Edge, through: Point): ArcEdge {
  return { kind: 'arc', ...roleOf(edge), through };
}

export function curveLike(edge: Edge, via: readonly Point[]): CurveEdge {
  return { kind: 'curve', ...roleOf(edge), via };
}
