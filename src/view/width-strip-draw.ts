/** The plan-view strip's SVG markup: the port unrolled along the flow (x along, y across, ±width/2), pure strings. */
import { ticks } from './nice-numbers.ts';

/** What the strip shows; lengths in document units. */
export interface StripPicture {
  /** Heading, e.g. "Plan view: width profile (width-weighted flow)". */
  readonly title: string;
  /** Length unit label, e.g. "mm". */
  readonly unitLabel: string;
  /** The interpolated width along the port: along, width, along, width, ... ascending along. */
  readonly outline: ArrayLike<number>;
  /** The profile's stations, drawn as handles on the upper edge. */
  readonly stations: readonly { readonly along: number; readonly width: number }[];
  /** Obstructions as notches in the middle of the passage: along-port stretch and diameter. */
  readonly notches: readonly { readonly name: string; readonly start: number; readonly end: number; readonly diameter: number }[];
  /** Vertical marks, e.g. the seat, at a distance along. */
  readonly marks: readonly { readonly along: number; readonly label: string }[];
  /** Length of port shown, document units (> 0). */
  readonly alongMax: number;
}

/** Scales from strip units to CSS px: x from `along`, y from the signed half-width (up is +). */
export interface StripScale {
  readonly left: number;
  readonly right: number;
  readonly midY: number;
  /** CSS px per document unit, along and across (the strip is not drawn to one scale). */
  readonly pxAlong: number;
  readonly pxAcross: number;
}

/** Strip margins, CSS px: room for the title above, tick labels below and the width ticks on the left. */
export const STRIP_PAD = { left: 40, right: 14, top: 18, bottom: 16 } as const;
/** Handle radius, CSS px. */
export const STATION_RADIUS_PX = 6;

/** The scale for a strip `width` x `height` CSS px showing along 0..alongMax and widths up to `widthMax`. */
export function stripScale(width: number, height: number, alongMax: number, widthMax: number): StripScale {
  const left = STRIP_PAD.left, right = Math.max(left + 10, width - STRIP_PAD.right);
  const across = Math.max(10, height - STRIP_PAD.top - STRIP_PAD.bottom);
  return { left, right, midY: STRIP_PAD.top + across / 2, pxAlong: (right - left) / alongMax, pxAcross: across / (widthMax * 1.1) };
}

export const toX = (s: StripScale, along: number) => s.left + along * s.pxAlong;
export const toY = (s: StripScale, halfWidth: number) => s.midY - halfWidth * s.pxAcross;

/** The whole strip's markup for a picture at a scale; `active` is the index of a station being dragged, or -1. */
export function stripMarkup(p: StripPicture, s: StripScale, height: number, active: number): string {
  const upper: string[] = [], lower: string[] = [];
  for (let k = 0; k + 1 < p.outline.length; k += 2) {
    const x = toX(s, p.outline[k]).toFixed(1);
    upper.push(`${x},${toY(s, p.outline[k + 1] / 2).toFixed(1)}`);
    lower.push(`${x},${toY(s, -p.outline[k + 1] / 2).toFixed(1)}`);
  }
  const passage = upper.length > 1 ? `<polygon class="strip-passage" points="${upper.join(' ')} ${lower.reverse().join(' ')}"/>` : '';
  return [axes(p, s, height), passage, ...notches(p.notches, s), ...p.marks.map((m) => mark(m, s, height)), ...stationHandles(p, s, active),
    `<text class="strip-title" x="${s.left}" y="12">${escapeText(p.title)}</text>`].join('');
}

/** Along-port ticks below, the centre line, and the width scale on the left. */
function axes(p: StripPicture, s: StripScale, height: number): string {
  const along = ticks(0, p.alongMax, Math.max(2, Math.floor((s.right - s.left) / 70)));
  const y = height - 3;
  const labels = along.values.map((v) => `<text class="strip-tick" x="${toX(s, v).toFixed(1)}" y="${y}" text-anchor="middle">${String(v)}</text>`);
  // Width ticks are whole widths (a line at +w/2 and one at -w/2), labelled on the upper one.
  const widest = (2 * (s.midY - STRIP_PAD.top)) / s.pxAcross;
  // Widest first, and none whose label would sit within 14 px of the one above it.
  const shown: number[] = [];
  for (const w of ticks(0, widest, 3).values.filter((v) => v > 0).reverse()) {
    if (shown.length === 0 || ((shown[shown.length - 1] - w) / 2) * s.pxAcross >= 14) shown.push(w);
  }
  const widths = shown.map((w) => {
    const up = toY(s, w / 2).toFixed(1), down = toY(s, -w / 2).toFixed(1);
    return `<text class="strip-tick" x="${s.left - 4}" y="${(Number(up) + 4).toFixed(1)}" text-anchor="end">${String(w)}</text>` +
      `<line class="strip-grid" x1="${s.left}" x2="${s.right}" y1="${up}" y2="${up}"/><line class="strip-grid" x1="${s.left}" x2="${s.right}" y1="${down}" y2="${down}"/>`;
  });
  const unit = `<text class="strip-tick" x="${s.right}" y="12" text-anchor="end">along the port and width, ${escapeText(p.unitLabel)}</text>`;
  return `<line class="strip-centre" x1="${s.left}" x2="${s.right}" y1="${s.midY}" y2="${s.midY}"/>` + labels.join('') + widths.join('') + unit;
}

/**
 * Obstructions: a bar of each one's diameter across the middle of the passage, over its stretch along; the names
 * stacked above the widest bar, so a stem inside a guide boss keeps its label clear.
 */
function notches(list: StripPicture['notches'], s: StripScale): string[] {
  const top = toY(s, Math.max(0, ...list.map((n) => n.diameter)) / 2);
  return list.map((n, k) => {
    const x = toX(s, n.start), w = Math.max(2, (n.end - n.start) * s.pxAlong);
    const y = toY(s, n.diameter / 2), h = Math.max(2, n.diameter * s.pxAcross);
    return `<g class="strip-notch"><title>${escapeText(n.name)}</title><rect x="${x.toFixed(1)}" y="${y.toFixed(1)}" width="${w.toFixed(1)}" height="${h.toFixed(1)}"/>` +
      `<text class="strip-tick" x="${(x + w / 2).toFixed(1)}" y="${(top - 3 - 11 * k).toFixed(1)}" text-anchor="middle">${escapeText(n.name)}</text></g>`;
  });
}

function mark(m: StripPicture['marks'][number], s: StripScale, height: number): string {
  const x = toX(s, m.along).toFixed(1);
  return `<line class="strip-mark" x1="${x}" x2="${x}" y1="${STRIP_PAD.top}" y2="${height - STRIP_PAD.bottom}"/>` +
    `<text class="strip-mark-label" x="${x}" y="${height - STRIP_PAD.bottom - 3}" dx="3">${escapeText(m.label)}</text>`;
}

/** A handle on the upper edge at each station, with a faint line across the passage there. */
function stationHandles(p: StripPicture, s: StripScale, active: number): string[] {
  return p.stations.map((st, k) => {
    const x = toX(s, st.along).toFixed(1);
    const top = toY(s, st.width / 2).toFixed(1), bottom = toY(s, -st.width / 2).toFixed(1);
    return `<line class="strip-station" x1="${x}" x2="${x}" y1="${top}" y2="${bottom}"/>` +
      `<circle class="strip-handle${k === active ? ' active' : ''}" data-station="${k}" cx="${x}" cy="${top}" r="${STATION_RADIUS_PX}"><title>Station ${k + 1}: drag up or down for its width, left or right along the port</title></circle>`;
  });
}

function escapeText(text: string): string {
  return text.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c] ?? c);
}
