/** The section document: plain readonly JSON, the one thing a user saves. Coordinates in the document's units. */

export type Units = 'mm' | 'inch';

/** [x, y] in document units; y up. */
export type Point = readonly [number, number];

/** What an edge of the outline is to the flow. */
export type EdgeRole = 'wall' | 'inlet' | 'outlet';

/** Trade names a wall may carry; free text is allowed too. */
export const WALL_NAMES = [
  'short side', 'long side', 'roof', 'floor', 'bowl (short side)', 'bowl (long side)', 'bowl', 'valve face', 'valve back',
  'seat', 'throat', 'bore wall',
] as const;

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
  /**
   * Marks one of the two corners of the section outline where the generated seat, deck and test bore join the
   * hand-drawn port (see `Parts`). Only outline corners carry it, and an outline has none or exactly two.
   */
  readonly anchor?: true;
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

/**
 * The valve axis in the section: the centre of the seat's gauge line and the direction the valve opens.
 * The gauge line is where the outer edge of the valve's seat face meets the seat when the valve is shut.
 */
export interface ValveAxis {
  /** Centre of the gauge line, document units. */
  readonly x: number;
  readonly y: number;
  /** Lean of the opening direction from straight down (-y), degrees, counter-clockwise positive: 10 opens down and to +x. */
  readonly inclinationDeg: number;
}

/** The valve head, generated as the island "valve head". Lengths in document units, angles in degrees. */
export interface ValvePart {
  /** Head diameter. */
  readonly diameter: number;
  /** Seat face angle from the plane of the head (45 usual); the seat is cut to the same angle. */
  readonly seatAngleDeg: number;
  /** Width of the valve's seat face, measured along the face. */
  readonly seatFaceWidth: number;
  /** Cylindrical edge between the face and the seat face, along the axis. */
  readonly margin: number;
  /** Angle of the back cut above the seat face, from the plane of the head. */
  readonly backCutAngleDeg: number;
  /** Thickness of the head from its face to its back, along the axis. */
  readonly headThickness: number;
  readonly stemDiameter: number;
  /** Length of stem drawn, from the valve face up the axis (the section shows a stub, not the whole stem). */
  readonly stemLength: number;
  readonly axis: ValveAxis;
  /** Lift off the seat along the opening direction; 0 is shut. */
  readonly lift: number;
}

/** The seat cut and the throat under it, generated round the valve axis. Lengths in document units, angles in degrees. */
export interface SeatPart {
  /** Throat diameter as a percentage of the valve head diameter (90 to 91 the usual choice). */
  readonly throatPct: number;
  /** Seat width along the seat face (the face is at the valve's seat angle). */
  readonly seatWidth: number;
  /** Cut between the seat and the deck (chamber side), from the plane of the head (30 usual). */
  readonly topCutAngleDeg: number;
  /** Cut between the seat and the throat (port side), from the plane of the head (60 usual). */
  readonly bottomCutAngleDeg: number;
  /** Throat moved sideways, % of the throat radius, positive toward the valve's +x side (its right when it opens down). */
  readonly throatOffsetPct: number;
  /** Height of the gauge line above the deck face, along the cylinder axis (y); the top cut runs down to the deck. */
  readonly recess: number;
}

/** The flow-bench test bore under the deck, with the outlet at its far end. Lengths in document units. */
export interface BorePart {
  readonly diameter: number;
  readonly depth: number;
  /** Distance from the valve edge to the nearer bore wall, which is on the manifold side (the inlet's side of the axis). */
  readonly valveEdgeToWall: number;
}

/** Port-side numbers the porter measured; the 2D section cannot give an area by itself. */
export interface PortPart {
  /** Flow area of the port at its tightest cross-section, document units squared. */
  readonly tightestArea: number;
}

/**
 * Parametric parts of a variant. The section holds their generated geometry, so any reader sees the real shape;
 * the parts are the source, and regenerating (src/parts applyParts) replaces the island named "valve head" and,
 * with a seat and bore, the outline's edges from one anchor corner to the other (the stretch with no inlet).
 * A seat or bore needs the valve; the seat and bore come together.
 */
export interface Parts {
  readonly valve?: ValvePart;
  readonly seat?: SeatPart;
  readonly bore?: BorePart;
  readonly port?: PortPart;
}

/** The humid-air formula the bench panel uses: CIPM-2007 (the default) or an ideal mixture of dry air and vapour. */
export type BenchHumidityModel = 'cipm-2007' | 'ideal-mixture';
/** The valve area a discharge coefficient is taken against (the default is the curtain). */
export type BenchReferenceArea = 'curtain' | 'throat' | 'valve head';
/** Which speed the panel offers as the boundary-layer march's flow scale (the default is the ideal speed). */
export type BenchFlowScale = 'ideal speed' | 'bench flow / port area' | 'mean port speed';

/**
 * What the porter typed and chose in the "Air and bench" panel for one variant. Numbers are in SI with the unit in
 * the key (K, Pa, m, m², m³/s), whatever units the drawing or the panel shows; three are in the trade's own units
 * (percent, rev/min, hp per CFM at 28 in H2O). A number left out is a field left empty; a choice left out is the
 * panel's default. The panel's display units are a viewing preference and are not part of the file. Bounds are the
 * panel's own (limits.ts BENCH_BOUNDS), so anything the panel accepts the file accepts.
 */
export interface BenchInputs {
  /** Room air temperature, K. */
  readonly airTemperatureK?: number;
  /** The room's own barometric pressure (not a sea-level report), Pa. */
  readonly barometricPressurePa?: number;
  /** Relative humidity of the room, percent. */
  readonly relativeHumidityPct?: number;
  /** Depression the bench pulls across the port, Pa (28 in H2O is 6974.5 Pa). */
  readonly testPressurePa?: number;
  /** Flow the bench measured at the test pressure, m³/s. */
  readonly measuredFlowM3PerS?: number;
  /** Cylinder bore, m. */
  readonly boreM?: number;
  /** Stroke, m. */
  readonly strokeM?: number;
  /** Engine speed, crankshaft rev/min. */
  readonly engineSpeedRpm?: number;
  /** Number of cylinders, a whole number. */
  readonly cylinderCount?: number;
  /** Port area typed by the porter, m²; left out while the panel follows the drawing's port area. */
  readonly portAreaM2?: number;
  /** Inlet valve diameter typed by the porter, m; left out while the panel follows the valve part. */
  readonly valveDiameterM?: number;
  /** Mean flow coefficient C_i against the valve head area over the open period, for the Mach index. */
  readonly meanFlowCoefficient?: number;
  /** The power rule's coefficient, hp per CFM at 28 in H2O (a rule of the trade quoted in those units). */
  readonly hpPerCfm?: number;
  readonly humidityModel?: BenchHumidityModel;
  readonly referenceArea?: BenchReferenceArea;
  readonly flowScale?: BenchFlowScale;
}

/** The passage width at one place along the port. */
export interface WidthStation {
  /** Distance from the manifold (inlet) face along the flow, document units: the reading's Station.distanceFromInlet. */
  readonly along: number;
  /** Passage width normal to the section, document units, > 0. */
  readonly width: number;
}

/**
 * A valve stem or guide boss in the bowl: inside the stretch [from, to] of the valve axis, within diameter/2 of the
 * axis line, the width is reduced by the diameter (never below 10% of the local width). Needs `parts.valve`.
 */
export interface WidthObstruction {
  /** What it is, e.g. "valve stem" or "guide boss". */
  readonly name: string;
  /** Document units. */
  readonly diameter: number;
  /** Extent along the valve axis measured up from the valve's gauge-line centre (parts.valve.axis), document units, from < to. */
  readonly from: number;
  readonly to: number;
}

/**
 * The port's width normal to the section along its length (format version 5): widths at stations along the flow,
 * interpolated smoothly along it and constant across it, less any obstructions. No profile means unit depth.
 */
export interface WidthProfile {
  /** At least 2, strictly ascending `along`. */
  readonly stations: readonly WidthStation[];
  readonly obstructions?: readonly WidthObstruction[];
}

/**
 * A variant solved as the round thing it is (format version 5): the section is turned about an axis in its plane,
 * so the passage depth is b = 2 pi r, r the distance from the axis, and only the half-plane on the kept side of the
 * axis is solved (the axis is a line of symmetry that carries no flux). For the valve, seat and bore region.
 */
export interface AxisymmetricModel {
  /**
   * The axis: a point on it (document units) and its direction, given as a valve axis is (the direction leans
   * `inclinationDeg` counter-clockwise from straight down, -y; 90 points along +x). Left out: the valve's own axis
   * (parts.valve.axis), which the variant then needs.
   */
  readonly axis?: { readonly x: number; readonly y: number; readonly inclinationDeg: number };
  /**
   * The side of the axis that is solved, named as SeatPart.throatOffsetPct names sides: looking along the axis
   * direction (the way the valve opens) as drawn, 'right' is the side the direction turns to a quarter turn
   * counter-clockwise in the section's plane (x right, y up), 'left' the other. With the axis opening straight down
   * (-y), 'right' is +x and 'left' is -x; with an axis along +x (inclination 90), 'right' is +y.
   */
  readonly keep: 'left' | 'right';
}

/**
 * A named alternative of the section, e.g. "tight short side" and "generous short side".
 *
 * Room left for later data, each an optional key added with a format version step of its own and an identity
 * migration (older files simply lack it); none is written as an empty placeholder now:
 * - `benchSheet`: the variant's flow-bench sheet (measured rows of lift and flow);
 * - the document-level `underlay` (a photo of the sectioned casting traced over) sits beside `settings`.
 */
export interface Variant {
  readonly name: string;
  readonly note?: string;
  /** Parametric valve, seat, test bore and port numbers; their geometry is already in `section`. */
  readonly parts?: Parts;
  /** The air-and-bench panel's inputs for this variant (format version 4); left out when none were typed. */
  readonly bench?: BenchInputs;
  /** The passage width along the port (format version 5); left out for a section solved per unit depth. */
  readonly width?: WidthProfile;
  /** Solve the variant as round about an axis (format version 5); never together with `width`. */
  readonly axisymmetric?: AxisymmetricModel;
  readonly section: Section;
}

export type GridDetail = 'preview' | 'standard' | 'fine';

export interface Settings {
  /** Grid detail of the full solve (saved since format version 2; the app and `solve` both solve on it). */
  readonly gridDetail: GridDetail;
}

export const FORMAT_NAME = 'portwright-section';
export const FORMAT_VERSION = 5;

/**
 * The saved file, current version. A later format step adds an optional `underlay` here (the photo of the sectioned
 * casting traced over), with its own version and an identity migration; see Variant for the keys kept per variant.
 */
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
