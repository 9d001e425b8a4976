/** Names for the things on a section a porter can grab: points, fillet handles, edges and the valve's own handles. */

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

/** The fillet-radius handle of a corner. */
export type FilletRef = { readonly kind: 'fillet'; readonly vertex: number; readonly island?: number };

/**
 * Handles of the variant's parametric valve (see src/parts), not of any outline:
 * - lift: the centre of the valve face; dragging it along the valve axis sets the lift
 * - valve-axis: the centre of the seat's gauge line; dragging it moves the valve, seat and test bore together
 */
export type PartHandleRef = { readonly kind: 'lift' } | { readonly kind: 'valve-axis' };

/**
 * Anything hit testing can return: a point, the fillet-radius handle of a corner, an edge (to insert on),
 * or one of the valve's handles.
 */
export type HandleRef =
  | PointRef
  | FilletRef
  | { readonly kind: 'edge'; readonly edge: number; readonly island?: number }
  | PartHandleRef;

export type HandleKind = HandleRef['kind'];

/** The `island` field of a reference as an object to spread: `{}` for the section outline. */
export function islandPart(island: number | undefined): { island?: number } {
  return island === undefined ? {} : { island };
}

/** Whether `ref` is one of the valve's handles rather than a part of an outline. */
export function isPartHandle(ref: HandleRef): ref is PartHandleRef {
  return ref.kind === 'lift' || ref.kind === 'valve-axis';
}

/** Whether two references name the same handle. */
export function sameHandle(a: HandleRef | null, b: HandleRef | null): boolean {
  if (a === null || b === null) return a === b;
  return JSON.stringify(a) === JSON.stringify(b);
}
