/** The colour bar: a small panel in the top right of the view with the map, round ticks and "speed ratio". */

import { colourCss } from './colour-map.ts';
import { ticks } from './nice-numbers.ts';
import { formatLevel, haloText } from './overlay-draw.ts';
import type { ValueRange } from './types.ts';
import { COLOUR_BAR, LABEL_FONT, LABEL_TEXT, SMALL_FONT } from './view-style.ts';

const COLOUR_BAR_TITLE = 'speed ratio';

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
   * Redraw for a range. `peak` is the field's highest value: when it lies above the range (auto range leaves out
   * the top 0.5 %, e.g. a sharp corner), the panel says so, because those cells show the top colour.
   */
  draw(range: ValueRange, peak: number, containerHeight: number, pixelRatio: number): void {
    const clipped = Number.isFinite(peak) && peak > range.max * (1 + 1e-6);
    const peakText = clipped ? `\u25B2 max ${formatLevel(peak)}` : '';
    // Each drag step brings a new field, often with the same range (always so with a fixed one): redraw only when
    // the panel would change.
    const key = `${range.min} ${range.max} ${peakText} ${containerHeight} ${pixelRatio}`;
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
    const bottom = height - (clipped ? 30 : 14);
    const x = 10;
    this.drawGradient(x, top, bottom);
    this.drawTicks(range, x + COLOUR_BAR.barWidth, top, bottom);
    if (clipped) {
      ctx.textAlign = 'left';
      haloText(ctx, peakText, 8, height - 12, LABEL_TEXT, SMALL_FONT);
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
