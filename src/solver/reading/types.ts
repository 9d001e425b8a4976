/** Data the flow reading gives: stations, slow zones, over-wide stations, wall readings, detachment, streamlines, findings. */

/** Document length units, for wording and for metres per unit. */
export type LengthUnits = 'mm' | 'inch';

/** Settings of a flow reading; every field has a stated default. */
export interface ReadingOptions {
  /** Number of equipotential stations from inlet to outlet; default 40. */
  readonly stationCount?: number;
  /** Name of the island that is the valve head; stations upstream of it are the port's. Default "valve head". */
  readonly valveIslandName?: string;
  /** A cell is slow below this share of its station's mean speed; default 0.35. */
  readonly slowFraction?: number;
  /** A station is over-wide when wider than its smoothed envelope by more than this share; default 0.10. */
  readonly overWideThreshold?: number;
  /** Stations in the over-wide smoothing window (odd, >= 3); default 5. */
  readonly overWideWindow?: number;
  /** Units of the document's lengths; default 'mm'. */
  readonly units?: LengthUnits;
  /** Metres per document length unit; default from `units` (0.001 for mm, 0.0254 for inch). */
  readonly metresPerUnit?: number;
  /**
   * Mean inlet speed in m/s that scales the speed ratios for the boundary-layer march: a flow scale, not a result.
   * Default 60 m/s, a stated default inside the usual 33-90 m/s design range of inlet gas speeds.
   */
  readonly inletMeanSpeedMs?: number;
  /** Kinematic viscosity of the air, m^2/s; the caller computes it from air properties. Default 1.5e-5 (air near 20 C). */
  readonly kinematicViscosityM2s?: number;
  /** State of the boundary layer at each wall's upstream end; default 'turbulent' (manifold flow is). */
  readonly start?: 'turbulent' | 'laminar';
  /** Head's shape factor H at which the turbulent layer detaches; default 2.4. */
  readonly shapeFactorLimit?: number;
  /** Number of streamlines, seeded at equal flux along the inlet; default 24. */
  readonly streamlineCount?: number;
  /**
   * The deck, where the flow bench's test bore meets the head. Past it lies the bore, which is no part of the port:
   * its cells and stations are read and drawn but not judged (no slow zone, over-wide or tightest station, finding).
   * Default none: the whole section is judged. Wall speeds and the wall march are the same either way.
   */
  readonly deck?: DeckLine;
}

/** A line and the side of it that is not judged: the half-plane (p - point) . normal > 0, document units. */
export interface DeckLine {
  /** A point on the line. */
  readonly x: number;
  readonly y: number;
  /** Normal pointing into the part not judged (the test bore); need not be of unit length. */
  readonly normalX: number;
  readonly normalY: number;
}

/** One equipotential cross-section. */
export interface Station {
  /** Potential of the station, 1 at the inlet, 0 at the outlet. */
  readonly phi: number;
  /** Pieces of the equipotential inside the fluid; each x0, y0, x1, y1, ... in document units. */
  readonly lines: readonly Float64Array[];
  /** Length of the equipotential within the fluid, document units (per unit depth model). */
  readonly width: number;
  /**
   * Integral of the passage depth along the lines (FlowDomain.depth), document units squared: the station's
   * cross-section area. Without a depth it is the width (unit depth).
   */
  readonly area: number;
  /** Station mean speed over the mean inlet speed: (flux / area) / inlet mean speed. */
  readonly meanSpeedRatio: number;
  /** Length-weighted centroid of the station's lines, document units. */
  readonly midX: number;
  readonly midY: number;
  /** Distance from the inlet along the path through the station centroids, document units. */
  readonly distanceFromInlet: number;
  /** The two line ends farthest apart, document units. */
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
  /**
   * False when more than half of the station's length lies past the deck (in the test bore): such a station is
   * drawn and read but not judged (never tightest or over-wide). True when there is no deck.
   */
  readonly judged: boolean;
}

/**
 * The station of least area upstream of the valve (the narrowest without a depth, where area = width): its width,
 * area, span ends and distance from the inlet (see Station).
 */
export interface TightestStation extends Pick<Station, 'width' | 'area' | 'x1' | 'y1' | 'x2' | 'y2' | 'distanceFromInlet'> {
  /** index into FlowReading.stations */
  readonly index: number;
}

export interface SlowZones {
  /**
   * 1 where a solved cell moves below slowFraction of its station's mean speed, else 0; row-major i + j * nx.
   * Cells whose centre lies past the deck (see ReadingOptions.deck) are never marked.
   */
  readonly mask: Uint8Array;
  /**
   * Slow fluid area / solved fluid area over the judged section (all of it without a deck; cell fraction weighted;
   * with a passage depth, cell fraction times the depth at the cell centre: a share of the volume), 0..1.
   */
  readonly share: number;
  /** The same share over the port only (judged cells upstream of the valve; all judged cells when there is no valve). */
  readonly portShare: number;
  /** Centre and radius (document units) of the largest joined slow patch in the port, or null when there is none. */
  readonly largest: { readonly x: number; readonly y: number; readonly radius: number; readonly area: number } | null;
}

/** A station wider than its neighbours: its width and span ends (see Station), and by how much. */
export interface OverWideStation extends Pick<Station, 'width' | 'x1' | 'y1' | 'x2' | 'y2'> {
  /** index into FlowReading.stations */
  readonly index: number;
  /** Width of the smoothed envelope there, document units. */
  readonly envelope: number;
  /** width - envelope, document units. */
  readonly excess: number;
}

/** A point along a wall; s is the arc length from the wall's upstream end, document units. */
export interface WallPoint {
  readonly s: number;
  readonly x: number;
  readonly y: number;
}

/** Speed along one wall, read downstream (direction of falling potential). */
export interface WallReading {
  readonly name: string;
  /** Samples in downstream order: x, y, s (from the upstream end), speed ratio; 4 numbers a sample. */
  readonly samples: Float64Array;
  /** True when the wall starts ahead of the valve (upstream end above the valve head's potential), or there is no valve. */
  readonly inPort: boolean;
  /** Highest speed ratio on the wall and where. */
  readonly peak: WallPoint & { readonly speedRatio: number };
  /** Lowest speed ratio downstream of the peak and where (the peak itself when nothing downstream is slower). */
  readonly low: WallPoint & { readonly speedRatio: number };
  /** low / peak speed ratio, 0..1. */
  readonly fall: number;
  /** Pressure recovered after the peak, Cp = 1 - (low / peak)^2. */
  readonly pressureRecovered: number;
}

/** Which test found the detachment: Thwaites (laminar), Head's shape-factor limit or Stratford's criterion (turbulent). */
export type DetachmentMethod = 'thwaites' | 'head' | 'stratford';

export interface WallDetachmentReading {
  readonly name: string;
  /**
   * Where the layer first leaves the wall (document units), or null when it stays on: the earlier of the march's
   * detachment (Thwaites or Head) and Stratford's point. shapeFactor is the marched H there.
   */
  readonly detachment: (WallPoint & { readonly method: DetachmentMethod; readonly shapeFactor: number }) | null;
  /** Stratford's separation point (a second opinion), or null. */
  readonly stratford: WallPoint | null;
  /** Stretches [sStart, sEnd] (document units from the upstream end) where the flow is likely off the wall. */
  readonly offWall: readonly (readonly [number, number])[];
}

/** Why a streamline stopped. */
export type StreamlineEnd = 'outlet' | 'wall' | 'stalled' | 'length';

export interface Streamline {
  /** x0, y0, x1, y1, ... document units, from the inlet downstream. */
  readonly xy: Float64Array;
  readonly end: StreamlineEnd;
}

export type FindingKind = 'detachment' | 'tightest' | 'slow' | 'over-wide' | 'peak';

export interface Finding {
  /** Ranking score, 0..1, larger first (an ordering heuristic, not a physical quantity). */
  readonly score: number;
  readonly text: string;
  readonly kind: FindingKind;
  /** Where to zoom the view: centre and radius, document units. */
  readonly x: number;
  readonly y: number;
  readonly radius: number;
}

/** The model the flow was solved in: plane (per unit depth), a width profile (sampled depth), or round about an axis. */
export type PassageModel = 'plane' | 'width' | 'axisymmetric';

export interface FlowReading {
  /** Which passage depth the solve had (FlowDomain.depth): none is 'plane', sampled is 'width'. */
  readonly model: PassageModel;
  readonly stations: readonly Station[];
  /** Potential above which a station lies upstream of the valve (the valve head's highest wall potential), or null without a valve. */
  readonly valvePhi: number | null;
  /** The station of least area ahead of the valve (judged stations only); with a depth, chosen by area. */
  readonly tightest: TightestStation | null;
  /**
   * Integral of the depth over the fluid above the deck (the port and bowl, not the test bore): document units cubed;
   * without a depth the fluid area times a unit depth, document units squared.
   */
  readonly portVolume: number;
  readonly slow: SlowZones;
  readonly overWide: readonly OverWideStation[];
  readonly walls: readonly WallReading[];
  readonly detachments: readonly WallDetachmentReading[];
  readonly streamlines: readonly Streamline[];
  readonly findings: readonly Finding[];
}
