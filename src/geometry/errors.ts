/** Typed errors for section geometry a porter can cause (and fix), with the place they happen. */

import type { Point } from '../document/types.ts';

export type GeometryErrorCode =
  /** A fillet radius larger than its neighbouring edges allow. */
  | 'fillet-too-large'
  /** Two edges of one outline (the section or one island) cross or touch. */
  | 'self-crossing'
  /** An edge whose two ends (or two of its points) coincide. */
  | 'zero-length'
  /** An arc whose `through` point sits on one of its ends, or on the line outside them. */
  | 'bad-arc'
  /** An island crosses the section outline or another island. */
  | 'island-crossing'
  /** An island lies outside the section outline. */
  | 'island-outside'
  /** An island lies inside another island. */
  | 'island-in-island'
  /** Fewer than 3 vertices, edge count not matching vertex count, or a non-finite number. */
  | 'bad-outline'
  /** A chordal tolerance that is not a positive finite length. */
  | 'bad-tolerance';

/** Where an error is, and the numbers behind it. Indices are 0-based, as in the document. */
export interface GeometryErrorDetail {
  /** Point (document units) to show the porter. */
  readonly where?: Point;
  readonly edgeIndex?: number;
  /** Second edge of a crossing. */
  readonly otherEdgeIndex?: number;
  readonly vertexIndex?: number;
  /** Island the (first) edge or vertex belongs to; absent for the section outline. */
  readonly islandName?: string;
  /** Island of the second edge of a crossing; absent for the section outline. */
  readonly otherIslandName?: string;
  /** Fillet radius asked for, document units. */
  readonly radius?: number;
  /** Largest fillet radius that fits, document units. */
  readonly largestRadius?: number;
}

/** The detail's fields sit on the error itself (declared once, in GeometryErrorDetail). */
export interface GeometryError extends GeometryErrorDetail {}

export class GeometryError extends Error {
  readonly code: GeometryErrorCode;

  constructor(code: GeometryErrorCode, message: string, detail: GeometryErrorDetail = {}) {
    super(message);
    this.name = 'GeometryError';
    this.code = code;
    Object.assign(this, detail);
  }
}

/** "the section outline" or `island "valve"`, for messages. */
export function outlineLabel(islandName?: string): string {
  return islandName === undefined ? 'the section outline' : `island "${islandName}"`;
}

/** First letter upper case, for a label that starts a sentence. */
export function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/** A length for a message: 3 significant digits, trailing zeros dropped, with the units label ("units" if unknown). */
export function formatLength(value: number, units = 'units', round: 'nearest' | 'down' = 'nearest'): string {
  return `${formatNumber(value, round)} ${unitLabel(units)}`;
}

/** A position for a message: "(12.5, -3.25) mm", 4 significant digits. */
export function formatPoint(p: readonly [number, number], units = 'units'): string {
  return `(${formatNumber(p[0], 'nearest', 4)}, ${formatNumber(p[1], 'nearest', 4)}) ${unitLabel(units)}`;
}

/** The one spelling of a length unit on screen: the document's "inch" is shown "in" (as src/breathing/units.ts labels it). */
function unitLabel(units: string): string {
  return units === 'inch' ? 'in' : units;
}

function formatNumber(value: number, round: 'nearest' | 'down', digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const scale = 10 ** (digits - 1 - Math.floor(Math.log10(Math.abs(value))));
  // Below about 1e-305 the scale overflows to Infinity (and the figure would read NaN): round by the digits alone.
  if (!Number.isFinite(scale)) return String(Number(value.toPrecision(digits)));
  // Rounding down keeps an "at most" figure honest: the stated radius really fits.
  // (1e-9 slack so 9.999999999999998, a rounding of 10, still shows as 10.)
  const rounded = round === 'down' ? Math.floor(value * scale * (1 + 1e-9)) / scale : Math.round(value * scale) / scale;
  return String(Number(rounded.toPrecision(digits)));
}
