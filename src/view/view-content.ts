/** What the view shows, and what it derives from it for drawing: contour lines, label places, colour range, bounds. */

import { cellMaskInside, ringsInside } from './clip.ts';
import { finiteMax, resolveColourRange } from './colour-range.ts';
import { contourLines, labelAnchors, type ContourLine, type LabelAnchor } from './contour-lines.ts';
import type {
  ColourRange,
  ContourLevels,
  FieldImage,
  FlagShapes,
  FluidClip,
  LengthUnits,
  Polyline,
  SectionBounds,
  ValueRange,
  ViewLayers,
  WallLine,
} from './types.ts';

const NO_FLAGS: FlagShapes = { hatched: [], hatchedCells: null, lines: [], markers: [] };
const NO_CONTOURS: ContourLine[] = [];
const NO_ANCHORS: LabelAnchor[] = [];
const ALL_LAYERS: ViewLayers = { field: true, contours: true, streamlines: true, walls: true, flags: true };

export class ViewContent {
  field: FieldImage | null = null;
  clip: FluidClip | null = null;
  levels: ContourLevels = [];
  colourRange: ColourRange = { mode: 'auto', min: 0, max: 1 };
  streamlines: readonly Polyline[] = [];
  walls: readonly WallLine[] = [];
  flags: FlagShapes = NO_FLAGS;
  layers: ViewLayers = ALL_LAYERS;
  units: LengthUnits = 'mm';

  /** Derived from field, clip and levels by update(). */
  contours: ContourLine[] = [];
  anchors: LabelAnchor[] = [];
  /** Derived from field and colourRange by updateRange(). */
  range: ValueRange = { min: 0, max: 1 };
  /** Highest finite field value, NaN without a field. */
  highest = NaN;
  /** The field's peak clear of sharp corners (FieldImage.clearPeak), NaN when not given. */
  clearPeak = NaN;

  /** Recompute contour lines and their label places (after the field, clip or levels change). */
  updateContours(): void {
    const f = this.field;
    if (!f || this.levels.length === 0) {
      // The same empty lists each time (every drag step comes here): the label layer sees nothing new to draw.
      this.contours = NO_CONTOURS;
      this.anchors = NO_ANCHORS;
      return;
    }
    const inside = this.clip ? ringsInside(this.clip) : cellMaskInside(f);
    this.contours = contourLines(f, this.levels, inside);
    // Candidate label places every twelfth of the field's diagonal, so crowded lines have places to choose from;
    // the overlay thins them on screen.
    const spacing = Math.hypot(f.nx * f.h, f.ny * f.h) / 12;
    this.anchors = labelAnchors(this.contours, spacing, spacing / 2);
  }

  /** Resolve the colour range (after the field or the range setting change). Throws on an empty fixed range. */
  updateRange(): void {
    const values = this.field ? this.field.values : null;
    this.range = resolveColourRange(this.colourRange, values);
    this.highest = values ? finiteMax(values) : NaN;
    this.clearPeak = this.field?.clearPeak ?? NaN;
  }

  /** Extent of the walls, or null when there are none. */
  get wallBounds(): SectionBounds | null {
    return boundsOf(this.walls.map((w) => w.xy));
  }

  /** Extent of the section: walls and clip outline, or the field's grid when neither is set. */
  contentBounds(): SectionBounds | null {
    const parts: ArrayLike<number>[] = this.walls.map((w) => w.xy);
    if (this.clip) parts.push(this.clip.outer.xy);
    const f = this.field;
    if (parts.length === 0 && f) parts.push([f.x0, f.y0, f.x0 + f.nx * f.h, f.y0 + f.ny * f.h]);
    return boundsOf(parts);
  }
}

/** Bounding box of flat x, y arrays; null when there is no point. */
function boundsOf(parts: readonly ArrayLike<number>[]): SectionBounds | null {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const xy of parts) {
    for (let k = 0; k + 1 < xy.length; k += 2) {
      minX = Math.min(minX, xy[k]);
      maxX = Math.max(maxX, xy[k]);
      minY = Math.min(minY, xy[k + 1]);
      maxY = Math.max(maxY, xy[k + 1]);
    }
  }
  return minX <= maxX ? { minX, minY, maxX, maxY } : null;
}
