/** Plain data the app hands to the view. The view never imports the solver, so it defines its own input shapes here. */

/** Length unit of section coordinates (the document's). */
export type LengthUnits = 'mm' | 'inch';

/**
 * A scalar field on a regular grid of square cells.
 * Cell (i, j) has its centre at (x0 + (i + 0.5) h, y0 + (j + 0.5) h), section units, y up.
 */
export interface FieldImage {
  readonly nx: number;
  readonly ny: number;
  /** Lower-left corner of cell (0, 0), section units. */
  readonly x0: number;
  readonly y0: number;
  /** Cell size, section units. */
  readonly h: number;
  /** Speed ratio per cell (dimensionless), row-major i + j * nx; NaN outside the fluid. */
  readonly values: Float32Array;
  /**
   * The peak speed ratio clear of sharp corners (the readings' peak), in the units of `values`; the colour bar names
   * a higher cell a corner spike. Left out: the bar names none.
   */
  readonly clearPeak?: number;
}

/** A polyline in section units. */
export interface Polyline {
  /** x0, y0, x1, y1, ... section units. */
  readonly xy: Float32Array | Float64Array;
  /** True when the last point joins back to the first. */
  readonly closed: boolean;
}

/** What a stretch of the outline is to the flow; each kind is drawn in its own style. */
export type WallKind = 'wall' | 'inlet' | 'outlet';

/** A named stretch of the outline, e.g. "short side". */
export interface WallLine {
  readonly name: string;
  /** x0, y0, x1, y1, ... section units. */
  readonly xy: Float32Array | Float64Array;
  readonly kind: WallKind;
  /** True for a closed ring such as a valve head; default false. */
  readonly closed?: boolean;
}

/** The fluid region as rings: the field is drawn only inside `outer` and outside every hole, so its edge follows the walls exactly. */
export interface FluidClip {
  readonly outer: Polyline;
  readonly holes: readonly Polyline[];
}

/** Which layers are drawn. */
export interface ViewLayers {
  readonly field: boolean;
  readonly contours: boolean;
  readonly streamlines: boolean;
  readonly walls: boolean;
  readonly flags: boolean;
}

/** Colour scale of the speed ratio: 'auto' picks a robust range from the field; 'fixed' uses min and max (e.g. shared by variants). */
export interface ColourRange {
  readonly mode: 'auto' | 'fixed';
  /** Speed ratio at the bottom of the colour map (used when mode is 'fixed'). */
  readonly min: number;
  /** Speed ratio at the top of the colour map (used when mode is 'fixed'). */
  readonly max: number;
}

/** A resolved colour scale: speed ratio at the bottom and top of the map. */
export interface ValueRange {
  readonly min: number;
  readonly max: number;
}

/** Speed-ratio values at which contour lines are drawn, e.g. [0.5, 1, 1.5]. */
export type ContourLevels = readonly number[];

/** A line flag such as the tightest station, drawn dashed with a short label. */
export interface FlagLine {
  /** x0, y0, x1, y1, ... section units. */
  readonly xy: Float32Array | Float64Array;
  readonly label: string;
}

/** A point flag such as a detachment point. */
export interface FlagMarker {
  /** Section units. */
  readonly x: number;
  readonly y: number;
  readonly label: string;
}

/** Cells to hatch (e.g. a slow zone), on a grid laid out as FieldImage. */
export interface CellMask {
  readonly nx: number;
  readonly ny: number;
  readonly x0: number;
  readonly y0: number;
  readonly h: number;
  /** 1 = hatched, 0 = not; row-major i + j * nx. */
  readonly mask: Uint8Array;
}

/** Flag overlays. Hatched areas come as polygons, as a cell mask, or both. */
export interface FlagShapes {
  /** Closed polygons to hatch (slow zones, over-wide areas). */
  readonly hatched: readonly Polyline[];
  /** Optional cell mask to hatch, for zones the solver reports per cell. */
  readonly hatchedCells?: CellMask | null;
  readonly lines: readonly FlagLine[];
  readonly markers: readonly FlagMarker[];
}

/**
 * Section-to-screen mapping in CSS pixels of the view's container (origin top left, y down):
 * screenX = offsetX + scale * x, screenY = offsetY - scale * y.
 * As an SVG transform: `matrix(scale 0 0 -scale offsetX offsetY)`.
 */
export interface SectionToScreen {
  /** CSS px per section unit. */
  readonly scale: number;
  readonly offsetX: number;
  readonly offsetY: number;
}

/** A rectangle in section units. */
export interface SectionBounds {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/** Options of a new FlowView; each can be changed later through its setter. */
export interface FlowViewOptions {
  readonly units?: LengthUnits;
  readonly contourLevels?: ContourLevels;
  readonly colourRange?: ColourRange;
  readonly layers?: Partial<ViewLayers>;
}

/** What the view has drawn, for checks and status lines (FlowView.diagnostics). */
export interface ViewDiagnostics {
  readonly scaleBarLabel: string;
  readonly contourLabels: number;
  readonly frames: number;
  readonly memory: { readonly geometries: number; readonly textures: number };
}
