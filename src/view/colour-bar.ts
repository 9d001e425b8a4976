/** The colour bar: a small panel in the top right of the view with the map, round ticks and "speed ratio". */

import { colourCss } from './colour-map.ts';
import { ticks } from './nice-numbers.ts';
import { formatLevel, haloText } from './overlay-draw.ts';
import type { ValueRange } from './types.ts';
import { COLOUR_BAR, LABEL_FONT, LABEL_TEXT, SMALL_FONT } from './view-style.ts';

const COLOUR_BAR_TITLE = 'speed ratio';
/**
 * The field's highest cell counts as a corner spike when it lies this far above the peak clear of sharp corners:
 * 2%, above the cell-to-cell scatter of a smooth peak, far below the spike at a sharp convex corner (which grows
 * without bound as the grid is refined).
 */
const SPIKE_MARGIN = 1.02;

/**
 * The lines under the bar for the top of the field, or none. Only a spike is told: the highest cell (`highest`)
 * above both the colour scale and the peak clear of sharp corners (`clearPeak`, the readings' peak speed ratio), so
 * the bar never shows a second number called a peak. Example: range 0..3.2, highest 7.66, clearPeak 3.54 ->
 * ['▲ corner spike', '7.66']; highest 3.55 -> [].
 */
export function spikeLines(range: ValueRange, highest: number, clearPeak: number): string[] {
  const aboveScale = Number.isFinite(highest) && highest > range.max * (1 + 1e-6);
  const spike = Number.isFinite(clearPeak) && highest > clearPeak * SPIKE_MARGIN;
  return aboveScale && spike ? ['\u25B2 corner spike', formatLevel(highest)] : [];
}

/** Height of the colour bar panel in a container `containerHeight` CSS px tall. */
function colourBarHeight(containerHeight: number): number {
  return Math.max(120, Math.min(COLOUR_BAR.maxHeight, containerHeight * 0.55));
}

/** Where the panel sits in a container of the given size, CSS px (labels keep out of it). */
export function colourBarBox(width: number, height: number): { x0: number; y0: number; x1: number; y1: number } {
  const m = COLOUR_BAR.margin;
  return { x0: width - m - COLOUR_BAR.width, y0: m, x1: width - m, y1: m + colourBarHeight(height) };
}

export class ColourBar {
  readonly canvas: HTMLCanvasElement;
  private readonly ctx: CanvasRenderingContext2D;
  /** Arguments of the last draw, to skip redrawing the same panel. */
  private drawn = '';

  constructor(parent: HTMLElement) {
    this.canvas = document.createElement('canvas');
    const s = this.canvas.style;
    s.position = 'absolute';
    s.top = s.right = `${COLOUR_BAR.margin}px`;
    s.pointerEvents = 'none';
    s.borderRadius = '6px';
    parent.appendChild(this.canvas);
    const ctx = this.canvas.getContext('2d', { willReadFrequently: true });
    if (!ctx) throw new Error('This browser cannot draw 2D canvas text.');
    this.ctx = ctx;
  }

  /**
   * Redraw for a range. `highest` is the field's highest value, `clearPeak` the peak clear of sharp corners: a
   * corner spike above the range (auto range leaves out the top 0.5 %) is named under the bar, because those cells
   * show the top colour (see spikeLines).
   */
  draw(range: ValueRange, highest: number, clearPeak: number, containerHeight: number, pixelRatio: number): void {
    const spike = spikeLines(range, highest, clearPeak);
    const clipped = spike.length > 0;
    // Each drag step brings a new field, often with the same range (always so with a fixed one): redraw only when
    // the panel would change.
    const key = `${range.min} ${range.max} ${spike.join(' ')} ${containerHeight} ${pixelRatio}`;
    if (key === this.drawn) return;
    this.drawn = key;
    const width = COLOUR_BAR.width;
    const height = colourBarHeight(containerHeight);
    this.canvas.width = Math.round(width * pixelRatio);
    this.canvas.height = Math.round(height * pixelRatio);
    this.canvas.style.width = `${width}px`;
    this.canvas.style.height = `${height}px`;
    const ctx = this.ctx;
    ctx.setTransform(pixelRatio, 0, 0, pixelRatio, 0, 0);
    ctx.fillStyle = COLOUR_BAR.panel;
    ctx.fillRect(0, 0, width, height);
    ctx.textBaseline = 'middle';
    ctx.textAlign = 'left';
    haloText(ctx, COLOUR_BAR_TITLE, 8, 14, LABEL_TEXT, LABEL_FONT);

    const top = 32;
    const bottom = height - (clipped ? 44 : 14);
    const x = 10;
    this.drawGradient(x, top, bottom);
    this.drawTicks(range, x + COLOUR_BAR.barWidth, top, bottom);
    if (clipped) {
      ctx.textAlign = 'left';
      haloText(ctx, spike[0], 8, height - 26, LABEL_TEXT, SMALL_FONT);
      haloText(ctx, spike[1], 20, height - 12, LABEL_TEXT, SMALL_FONT);
    }
  }

  private drawGradient(x: number, top: number, bottom: number): void {
    const ctx = this.ctx;
    const grad = ctx.createLinearGradient(0, bottom, 0, top);
    for (let k = 0; k <= 16; k++) grad.addColorStop(k / 16, colourCss(k / 16));
    ctx.fillStyle = grad;
    ctx.fillRect(x, top, COLOUR_BAR.barWidth, bottom - top);
    ctx.strokeStyle = 'rgba(238, 232, 218, 0.6)';
    ctx.lineWidth = 1;
    ctx.strokeRect(x + 0.5, top + 0.5, COLOUR_BAR.barWidth - 1, bottom - top - 1);
  }

  private drawTicks(range: ValueRange, x: number, top: number, bottom: number): void {
    const ctx = this.ctx;
    const span = range.max - range.min;
    // About one tick per 30 px keeps labels apart.
    const { values } = ticks(range.min, range.max, Math.max(2, Math.floor((bottom - top) / 30)));
    ctx.textAlign = 'left';
    for (const v of values) {
      const y = bottom - ((v - range.min) / span) * (bottom - top);
      ctx.beginPath();
      ctx.moveTo(x, y);
      ctx.lineTo(x + 5, y);
      ctx.strokeStyle = LABEL_TEXT;
      ctx.lineWidth = 1;
      ctx.stroke();
      haloText(ctx, formatLevel(v), x + 8, y, LABEL_TEXT, SMALL_FONT);
    }
  }

  dispose(): void {
    this.canvas.width = this.canvas.height = 0;
    this.canvas.remove();
  }
}
