/** Names for the things on a section a porter can grab: points, fillet handles and edges. */

/**
 * A draggable point of the active section. `island` absent means the section outline,
 * otherwise the index of the island (an island vertex is `{ kind: 'vertex', island, vertex }`).
 * - vertex: a corner, `vertices[vertex].at`
 * - through: an arc edge's `through` point
 * - via: a curve edge's `via[via]` point
 */
export type PointRef =
  | { readonly kind: 'vertex'; readonly vertex: number; readonly island?: number }
  | { readonly kind: 'through'; readonly edge: number; readonly island?: number }
  | { readonly kind: 'via'; readonly edge: number; readonly via: number; readonly island?: number };

/** Anything hit testing can return: a point, the fillet-radius handle of a corner, or an edge (to insert on). */
export type HandleRef =
  | PointRef
  | { readonly kind: 'fillet'; readonly vertex: number; readonly island?: number }
  | { readonly kind: 'edge'; readonly edge: number; readonly island?: number };

export type HandleKind = HandleRef['kind'];

/** The `island` field of a reference as an object to spread: `{}` for the section outline. */
export function islandPart(island: number | undefined): { island?: number } {
  return island === undefined ? {} : { island };
}

/** Whether two references name the same handle. */
export function sameHandle(a: HandleRef | null, b: HandleRef | null): boolean {
  if (a === null || b === null) return a === b;
  return JSON.stringify(a) === JSON.stringify(b);
}
