/** Contour-level labels on the overlay, spread so that every line is named and none crowd each other or the flags. */

import type { LabelAnchor } from './contour-lines.ts';
import { boxesOverlap, formatLevel, haloText, textBox, type Box } from './overlay-draw.ts';
import { LABEL_CLEAR_PX, LABEL_FONT, LABEL_GAP_PX, LABEL_TEXT } from './view-style.ts';
import { sectionToScreen, type ViewState } from './view-transform.ts';

type Ctx = CanvasRenderingContext2D;

/**
 * Contour labels, placed greedily in two passes over the anchors (middle of each line first): first every line
 * gets one label at its first clear place, then more go wherever there is room. A place is clear when it is on
 * screen, LABEL_GAP_PX from labels of the same level, LABEL_CLEAR_PX from any other label and clear of the
 * `blocked` boxes (flag labels and markers). Zooming in reveals
 * more labels; zooming out never piles them up. Returns how many were drawn.
 */
export function drawContourLabels(ctx: Ctx, view: ViewState, anchors: readonly LabelAnchor[], blocked: readonly Box[]): number {
  const placed: { x: number; y: number; level: number }[] = [];
  const margin = 16;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  const tryPlace = (a: LabelAnchor): boolean => {
    const p = sectionToScreen(view, a.x, a.y);
    if (p.x < margin || p.y < margin || p.x > view.width - margin || p.y > view.height - margin) return false;
    const crowded = placed.some((q) => {
      const d = Math.hypot(q.x - p.x, q.y - p.y);
      return d < (q.level === a.level ? LABEL_GAP_PX : LABEL_CLEAR_PX);
    });
    if (crowded) return false;
    const box = textBox(ctx, formatLevel(a.level), p.x, p.y, LABEL_FONT);
    if (blocked.some((b) => boxesOverlap(b, box))) return false;
    placed.push({ ...p, level: a.level });
    return true;
  };
  const labelled = new Set<number>();
  for (const a of anchors) if (!labelled.has(a.line) && tryPlace(a)) labelled.add(a.line);
  // A place already used fails its own same-level gap test, so the second pass never draws it twice.
  for (const a of anchors) tryPlace(a);
  for (const p of placed) haloText(ctx, formatLevel(p.level), p.x, p.y, LABEL_TEXT, LABEL_FONT);
  return placed.length;
}

