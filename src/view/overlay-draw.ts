/** 2D-canvas drawing of the view's text and small marks: flag labels, markers, end labels, scale bar. */

import { scaleBar } from './nice-numbers.ts';
import type { FlagLine, FlagMarker, LengthUnits, WallLine } from './types.ts';
import {
  FLAG_COLOUR,
  INLET_STYLE,
  LABEL_FONT,
  LABEL_HALO,
  LABEL_TEXT,
  OUTLET_STYLE,
  SCALE_BAR_MAX_PX,
  SMALL_FONT,
} from './view-style.ts';
import { sectionToScreen, type ViewState } from './view-transform.ts';

type Ctx = CanvasRenderingContext2D;

/** A screen rectangle, CSS px. */
export interface Box {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

export function boxesOverlap(a: Box, b: Box): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

/** Where `text` would land with the context's current font, alignment and baseline, halo included. */
export function textBox(ctx: Ctx, text: string, x: number, y: number, font: string): Box {
  ctx.font = font;
  const m = ctx.measureText(text);
  const pad = 2;
  return {
    x0: x - m.actualBoundingBoxLeft - pad,
    x1: x + m.actualBoundingBoxRight + pad,
    y0: y - m.actualBoundingBoxAscent - pad,
    y1: y + m.actualBoundingBoxDescent + pad,
  };
}

/** Text with a dark halo so it reads over any part of the colour map; returns the box it covers. */
export function haloText(ctx: Ctx, text: string, x: number, y: number, colour: string, font: string): Box {
  ctx.font = font;
  ctx.lineJoin = 'round';
  ctx.lineWidth = 3.5;
  ctx.strokeStyle = LABEL_HALO;
  ctx.strokeText(text, x, y);
  ctx.fillStyle = colour;
  ctx.fillText(text, x, y);
  return textBox(ctx, text, x, y, font);
}

/** Level as a porter reads it: 1.2, 0.85, 2 (no trailing zeros, at most 2 decimals). */
export function formatLevel(level: number): string {
  return String(Number(level.toFixed(2)));
}

/** Point flags: a ring with a dot, and the label beside it. Returns the boxes they cover. */
export function drawMarkers(ctx: Ctx, view: ViewState, markers: readonly FlagMarker[]): Box[] {
  ctx.textAlign = 'left';
  ctx.textBaseline = 'bottom';
  const boxes: Box[] = [];
  for (const m of markers) {
    const p = sectionToScreen(view, m.x, m.y);
    ctx.beginPath();
    ctx.arc(p.x, p.y, 6, 0, 2 * Math.PI);
    ctx.lineWidth = 4.5;
    ctx.strokeStyle = LABEL_HALO;
    ctx.stroke();
    ctx.lineWidth = 2;
    ctx.strokeStyle = FLAG_COLOUR;
    ctx.stroke();
    ctx.beginPath();
    ctx.arc(p.x, p.y, 1.8, 0, 2 * Math.PI);
    ctx.fillStyle = FLAG_COLOUR;
    ctx.fill();
    boxes.push({ x0: p.x - 9, y0: p.y - 9, x1: p.x + 9, y1: p.y + 9 });
    boxes.push(haloText(ctx, m.label, p.x + 9, p.y - 6, LABEL_TEXT, LABEL_FONT));
  }
  return boxes;
}

/** Screen point at the middle (by arc length) of a flat x, y polyline. */
function midpoint(view: ViewState, xy: ArrayLike<number>): { x: number; y: number; dx: number; dy: number } {
  const n = xy.length / 2;
  let total = 0;
  for (let k = 1; k < n; k++) total += Math.hypot(xy[2 * k] - xy[2 * k - 2], xy[2 * k + 1] - xy[2 * k - 1]);
  let s = 0;
  for (let k = 1; k < n; k++) {
    const dx = xy[2 * k] - xy[2 * k - 2];
    const dy = xy[2 * k + 1] - xy[2 * k - 1];
    const len = Math.hypot(dx, dy);
    if (s + len >= total / 2 && len > 0) {
      const t = (total / 2 - s) / len;
      const p = sectionToScreen(view, xy[2 * k - 2] + t * dx, xy[2 * k - 1] + t * dy);
      return { ...p, dx: dx / len, dy: -dy / len };
    }
    s += len;
  }
  const p = sectionToScreen(view, xy[0], xy[1]);
  return { ...p, dx: 1, dy: 0 };
}

/**
 * Line flags (e.g. the tightest station): the label continues the line past its last point, where it usually
 * lands outside the port and covers no flow.
 */
export function drawFlagLineLabels(ctx: Ctx, view: ViewState, lines: readonly FlagLine[]): Box[] {
  ctx.textBaseline = 'middle';
  const boxes: Box[] = [];
  for (const l of lines) {
    const n = l.xy.length / 2;
    if (n < 2) continue;
    const a = sectionToScreen(view, l.xy[2 * n - 4], l.xy[2 * n - 3]);
    const b = sectionToScreen(view, l.xy[2 * n - 2], l.xy[2 * n - 1]);
    const len = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    const ux = (b.x - a.x) / len;
    const uy = (b.y - a.y) / len;
    ctx.textAlign = ux >= 0 ? 'left' : 'right';
    boxes.push(haloText(ctx, l.label, b.x + ux * 10, b.y + uy * 10, FLAG_COLOUR, LABEL_FONT));
  }
  return boxes;
}

/** "inlet" and "outlet" beside their lines, on the side away from `centre` (screen px) so they sit outside the port. */
export function drawEndLabels(ctx: Ctx, view: ViewState, walls: readonly WallLine[], centre: { x: number; y: number }): Box[] {
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  const boxes: Box[] = [];
  for (const w of walls) {
    if (w.kind === 'wall' || w.xy.length < 4) continue;
    const m = midpoint(view, w.xy);
    // Normal to the line on screen; flip it to point away from the section's centre.
    let nx = -m.dy;
    let ny = m.dx;
    if (nx * (m.x - centre.x) + ny * (m.y - centre.y) < 0) {
      nx = -nx;
      ny = -ny;
    }
    const colour = w.kind === 'inlet' ? INLET_STYLE.colour : OUTLET_STYLE.colour;
    // Clear of the line by 8 px whatever the direction: half the text's extent along the normal, plus the gap.
    ctx.font = LABEL_FONT;
    const off = 8 + Math.abs(nx) * (ctx.measureText(w.kind).width / 2) + Math.abs(ny) * 7;
    boxes.push(haloText(ctx, w.kind, m.x + nx * off, m.y + ny * off, colour, LABEL_FONT));
  }
  return boxes;
}

/** Scale bar in the lower left corner: a round length in the document's units. Returns its text and its box. */
export function drawScaleBar(ctx: Ctx, view: ViewState, units: LengthUnits): { label: string; box: Box } {
  const bar = scaleBar(view.scale, SCALE_BAR_MAX_PX, units);
  const x = 16;
  const y = view.height - 16;
  ctx.lineCap = 'butt';
  for (const [width, colour] of [
    [5, LABEL_HALO],
    [2, LABEL_TEXT],
  ] as const) {
    ctx.beginPath();
    ctx.moveTo(x, y - 6);
    ctx.lineTo(x, y);
    ctx.lineTo(x + bar.px, y);
    ctx.lineTo(x + bar.px, y - 6);
    ctx.lineWidth = width;
    ctx.strokeStyle = colour;
    ctx.stroke();
  }
  ctx.textAlign = 'left';
  ctx.textBaseline = 'bottom';
  const text = haloText(ctx, bar.label, x, y - 8, LABEL_TEXT, SMALL_FONT);
  return { label: bar.label, box: { x0: x - 3, y0: text.y0, x1: Math.max(x + bar.px, text.x1) + 3, y1: y + 3 } };
}
