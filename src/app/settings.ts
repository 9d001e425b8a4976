/** The one settings object behind the panel: what to draw and how finely to solve. */
import type { GridDetail, Units } from '../document/types.ts';

export interface LayerSettings {
  field: boolean;
  contours: boolean;
  streamlines: boolean;
  walls: boolean;
  flags: boolean;
}

export type SpeedReference = 'mean inlet speed' | 'tightest station';

export interface AppSettings {
  gridDetail: GridDetail;
  /** Speed-ratio contour levels, comma separated. */
  contourLevels: string;
  colourMode: 'auto' | 'fixed';
  /** Fixed colour range in speed ratio (used when colourMode is 'fixed', so variants compare honestly). */
  colourMin: number;
  colourMax: number;
  /** What a speed ratio of 1 means. */
  reference: SpeedReference;
  layers: LayerSettings;
  units: Units;
  snapping: boolean;
  /** A cell is slow below this share of its station's mean speed. */
  slowFraction: number;
  /** Mean inlet speed, m/s: the flow scale for the boundary-layer march (not a result). */
  inletSpeedMs: number;
}

export function defaultSettings(): AppSettings {
  return {
    gridDetail: 'standard',
    contourLevels: '0.5, 0.75, 1, 1.25, 1.5, 2',
    colourMode: 'auto',
    colourMin: 0,
    colourMax: 2.5,
    reference: 'mean inlet speed',
    layers: { field: true, contours: true, streamlines: true, walls: true, flags: true },
    units: 'mm',
    snapping: false,
    slowFraction: 0.35,
    inletSpeedMs: 60,
  };
}

/** Parses "0.5, 1, 1.5" into sorted positive levels; ignores what is not a number. */
export function parseLevels(text: string): number[] {
  const levels = text.split(/[,;\s]+/).map(Number).filter((v) => Number.isFinite(v) && v > 0);
  return [...new Set(levels)].sort((a, b) => a - b);
}
