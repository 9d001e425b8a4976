/** A 2D canvas over the WebGL canvas for text and markers, redrawn with every frame of the view. */

import { colourBarBox } from './colour-bar.ts';
import type { LabelAnchor } from './contour-lines.ts';
import { drawContourLabels } from './contour-labels.ts';
import { drawEndLabels, drawFlagLineLabels, drawMarkers, drawScaleBar, type Box } from './overlay-draw.ts';
import type { FlagShapes, LengthUnits, SectionBounds, ViewLayers, WallLine } from './types.ts';
import { sectionToScreen, type ViewState } from './view-transform.ts';

export interface OverlayContent {
  readonly anchors: readonly LabelAnchor[];
  readonly walls: readonly WallLine[];
  /** Extent of the walls, to put end labels on the outside. */
  readonly wallBounds: SectionBounds | null;
  readonly flags: FlagShapes;
  readonly units: LengthUnits;
  readonly layers: ViewLayers;
}

export class LabelOverlay {
  readonly canvas: HTMLCanvasElement;
  private readonly ctx: CanvasRenderingContext2D;
  private pixelRatio = 1;
  /** What the scale bar said last time, e.g. "10 mm". */
  scaleBarLabel = '';
  /** How many contour labels were placed last time. */
  contourLabelCount = 0;
  /** What the last drawing was made from; the same again leaves the canvas untouched (the browser then need not
   * upload it again, which matters on every drag step). */
  private drawnFrom: readonly unknown[] = [];

  constructor(parent: HTMLElement) {
    this.canvas = document.createElement('canvas');
    const s = this.canvas.style;
    s.position = 'absolute';
    s.left = s.top = '0';
    s.pointerEvents = 'none';
    parent.appendChild(this.canvas);
    const ctx = this.canvas.getContext('2d', { willReadFrequently: true });
    if (!ctx) throw new Error('This browser cannot draw 2D canvas text.');
    this.ctx = ctx;
  }

  setSize(width: number, height: number, pixelRatio: number): void {
    this.pixelRatio = pixelRatio;
    // Rounded down, as three sizes the WebGL drawing buffer: the two layers then match pixel for pixel.
    this.canvas.width = Math.floor(width * pixelRatio);
    this.canvas.height = Math.floor(height * pixelRatio);
    this.canvas.style.width = `${width}px`;
    this.canvas.style.height = `${height}px`;
    this.drawnFrom = [];
  }

  draw(view: ViewState, content: OverlayContent): void {
    const from = drawnFrom(view, content);
    if (from.length === this.drawnFrom.length && from.every((v, k) => Object.is(v, this.drawnFrom[k]))) return;
    this.drawnFrom = from;
    const ctx = this.ctx;
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    ctx.clearRect(0, 0, this.canvas.width, this.canvas.height);
    // Draw in CSS px; the transform scales to device px so text is sharp on high-DPI screens.
    ctx.setTransform(this.pixelRatio, 0, 0, this.pixelRatio, 0, 0);
    const { layers } = content;
    // Flags, end labels, scale bar and colour bar first: contour labels then keep clear of the boxes they cover.
    const blocked: Box[] = [colourBarBox(view.width, view.height)];
    if (layers.walls && content.wallBounds) {
      const b = content.wallBounds;
      const centre = sectionToScreen(view, (b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2);
      blocked.push(...drawEndLabels(ctx, view, content.walls, centre));
    }
    if (layers.flags) {
      blocked.push(...drawFlagLineLabels(ctx, view, content.flags.lines));
      blocked.push(...drawMarkers(ctx, view, content.flags.markers));
    }
    const scale = drawScaleBar(ctx, view, content.units);
    this.scaleBarLabel = scale.label;
    blocked.push(scale.box);
    this.contourLabelCount = layers.contours ? drawContourLabels(ctx, view, content.anchors, blocked) : 0;
  }

  dispose(): void {
    this.canvas.width = this.canvas.height = 0;
    this.canvas.remove();
  }
}

/** Everything draw() reads, as values to compare: walls enter only through the inlet and outlet lines (end labels)
 * and the centre of their extent, so a drag that reshapes a wall does not redraw the labels. */
function drawnFrom(view: ViewState, c: OverlayContent): unknown[] {
  const b = c.layers.walls ? c.wallBounds : null;
  const ends = c.layers.walls ? c.walls.filter((w) => w.kind !== 'wall').map((w) => `${w.kind}:${Array.from(w.xy).join(',')}`).join(' ') : '';
  const l = c.layers;
  return [view.centreX, view.centreY, view.scale, view.width, view.height, c.units, l.walls, l.flags, l.contours,
    c.anchors, c.flags, ends, b ? (b.minX + b.maxX) / 2 : NaN, b ? (b.minY + b.maxY) / 2 : NaN];
}
