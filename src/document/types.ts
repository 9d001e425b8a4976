/** The section document: plain readonly JSON, the one thing a user saves. Coordinates in the document's units. */

export type Units = 'mm' | 'inch';

/** [x, y] in document units; y up. */
export type Point = readonly [number, number];

/** What an edge of the outline is to the flow. */
export type EdgeRole = 'wall' | 'inlet' | 'outlet';

/** Trade names a wall may carry; free text is allowed too. */
export const WALL_NAMES = ['short side', 'long side', 'roof', 'floor', 'bowl', 'valve face', 'valve back', 'seat', 'bore wall'] as const;

interface EdgeBase {
  readonly role: EdgeRole;
  /** Only meaningful for walls, e.g. "short side". */
  readonly wallName?: string;
}

/** Straight edge from its vertex to the next. */
export interface LineEdge extends EdgeBase {
  readonly kind: 'line';
}

/** Circular arc from its vertex to the next, passing through `through`. */
export interface ArcEdge extends EdgeBase {
  readonly kind: 'arc';
  readonly through: Point;
}

/** Smooth curve (centripetal Catmull-Rom) from its vertex to the next, passing through every `via` point in order. */
export interface CurveEdge extends EdgeBase {
  readonly kind: 'curve';
  readonly via: readonly Point[];
}

export type Edge = LineEdge | ArcEdge | CurveEdge;

/** A corner of the outline; an optional fillet rounds it (the short-side radius is such a fillet). */
export interface Vertex {
  readonly at: Point;
  /** Fillet radius in document units; absent or 0 means a sharp corner. */
  readonly filletRadius?: number;
}

/**
 * A closed outline. Edge i runs from vertex i to vertex (i + 1) mod n,
 * so edges.length === vertices.length (at least 3).
 */
export interface Outline {
  readonly vertices: readonly Vertex[];
  readonly edges: readonly Edge[];
}

/** A closed outline inside the section that the flow goes around, such as a valve head. All its edges are walls. */
export interface Island {
  readonly name: string;
  readonly outline: Outline;
}

/** One port section: the outer outline (walls, inlet, outlet) and its islands. */
export interface Section {
  readonly outline: Outline;
  readonly islands: readonly Island[];
}

/** A named alternative of the section, e.g. "tight short side" and "generous short side". */
export interface Variant {
  readonly name: string;
  readonly note?: string;
  readonly section: Section;
}

export type GridDetail = 'preview' | 'standard' | 'fine';

export interface Settings {
  /** Grid detail of the full solve. */
  readonly gridDetail: GridDetail;
}

export const FORMAT_NAME = 'portwright-section';
export const FORMAT_VERSION = 2;

/** The saved file, current version. */
export interface PortDocument {
  readonly format: typeof FORMAT_NAME;
  readonly version: typeof FORMAT_VERSION;
  readonly title: string;
  readonly units: Units;
  /** At least one; names unique. */
  readonly variants: readonly Variant[];
  /** Name of the variant shown and solved by default. */
  readonly activeVariant: string;
  readonly settings: Settings;
}
