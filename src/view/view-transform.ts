/** Pan and zoom state of the view and the section <-> screen mapping (pure functions, no DOM). */

import type { SectionBounds, SectionToScreen } from './types.ts';

/** Where the view looks. Screen coordinates are CSS px from the container's top left, y down; section y is up. */
export interface ViewState {
  /** Section point at the centre of the container, section units. */
  readonly centreX: number;
  readonly centreY: number;
  /** CSS px per section unit. */
  readonly scale: number;
  /** Container size, CSS px. */
  readonly width: number;
  readonly height: number;
}

/** Space kept free at each side when fitting (for the colour bar and the scale bar), CSS px. */
export interface Insets {
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;
}

/** Zoom limits, CSS px per section unit: wide enough for a whole head in inches, close enough for a seat cut in mm. */
const MIN_SCALE = 1e-3;
const MAX_SCALE = 1e5;

export function sectionToScreen(v: ViewState, x: number, y: number): { x: number; y: number } {
  return { x: v.width / 2 + (x - v.centreX) * v.scale, y: v.height / 2 - (y - v.centreY) * v.scale };
}

export function screenToSection(v: ViewState, px: number, py: number): { x: number; y: number } {
  return { x: v.centreX + (px - v.width / 2) / v.scale, y: v.centreY - (py - v.height / 2) / v.scale };
}

/** The mapping as scale and offsets (see SectionToScreen). */
export function affineOf(v: ViewState): SectionToScreen {
  return { scale: v.scale, offsetX: v.width / 2 - v.centreX * v.scale, offsetY: v.height / 2 + v.centreY * v.scale };
}

/** Zoom by `factor` (> 1 closer) keeping the section point under screen point (px, py) where it is. */
export function zoomAbout(v: ViewState, factor: number, px: number, py: number): ViewState {
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, v.scale * factor));
  const anchor = screenToSection(v, px, py);
  return {
    ...v,
    scale,
    centreX: anchor.x - (px - v.width / 2) / scale,
    centreY: anchor.y + (py - v.height / 2) / scale,
  };
}

/** Move the picture by (dx, dy) CSS px (drag direction). */
export function panBy(v: ViewState, dx: number, dy: number): ViewState {
  return { ...v, centreX: v.centreX - dx / v.scale, centreY: v.centreY + dy / v.scale };
}

/** New container size; the centre stays, so the picture does not jump on resize. */
export function resized(v: ViewState, width: number, height: number): ViewState {
  return { ...v, width: Math.max(1, width), height: Math.max(1, height) };
}

/** Largest scale that shows `b` whole inside the container less `insets`, centred in the free area. */
export function fitBounds(v: ViewState, b: SectionBounds, insets: Insets): ViewState {
  const freeW = Math.max(1, v.width - insets.left - insets.right);
  const freeH = Math.max(1, v.height - insets.top - insets.bottom);
  const bw = Math.max(b.maxX - b.minX, 1e-9);
  const bh = Math.max(b.maxY - b.minY, 1e-9);
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, Math.min(freeW / bw, freeH / bh)));
  return {
    ...v,
    scale,
    centreX: (b.minX + b.maxX) / 2 - (insets.left - insets.right) / (2 * scale),
    centreY: (b.minY + b.maxY) / 2 + (insets.top - insets.bottom) / (2 * scale),
  };
}

/** The section rectangle the container shows. */
export function visibleBounds(v: ViewState): SectionBounds {
  const hw = v.width / (2 * v.scale);
  const hh = v.height / (2 * v.scale);
  return { minX: v.centreX - hw, maxX: v.centreX + hw, minY: v.centreY - hh, maxY: v.centreY + hh };
}
