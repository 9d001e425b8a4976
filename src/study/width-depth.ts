/** The passage depth of a variant with a width profile: widths along the flow, less stems and bosses, on a lattice for the solver. */

import type { Section, ValveAxis, Variant, WidthObstruction, WidthProfile } from '../document/types.ts';
import { OBSTRUCTED_WIDTH_FLOOR } from '../document/limits.ts';
import { sectionToDomain } from '../geometry/index.ts';
import type { SampledDepth } from '../solver/types.ts';
import { alongFlowMap, type AlongFlowMap } from './along-flow.ts';
import { DRAG_CELLS } from './grid-detail.ts';
import { monotoneCubic } from './monotone-cubic.ts';
import { solveFlattenTolerance } from './flatten-tolerance.ts';

/**
 * Cells of the plane solve that maps the section to distance along the port, and of the depth lattice: the drag
 * grid's. Station distances on it differ from the standard grid's by under 0.2% of the port length on the street
 * samples (README, DEVELOPERS "Width profile"), far inside what a porter measures a width to.
 */
export const WIDTH_MAP_CELLS = DRAG_CELLS;

/**
 * The depth of `variant` (its section already regenerated, `section`) from its width profile, or undefined when it
 * has none. The lattice is the map grid's cell centres, the same whatever grid the case is then solved on, so every
 * grid detail solves one problem. Same input, same output; the last few are kept (a drag step sets up its case twice:
 * once to check it, once to solve it). Throws StudyError when the plane flow cannot be solved.
 */
export function variantWidthDepth(variant: Variant, section: Section, units: string): SampledDepth | undefined {
  const profile = variant.width;
  if (profile === undefined) return undefined;
  const key = JSON.stringify([units, variant.parts ?? null, profile]);
  const kept = recent.get(variant.section)?.find((entry) => entry.key === key);
  if (kept) return kept.depth;
  const domain = sectionToDomain(section, solveFlattenTolerance(section, WIDTH_MAP_CELLS), units);
  const depth = widthDepth(alongFlowMap(domain, WIDTH_MAP_CELLS), profile, variant.parts?.valve?.axis);
  const entries = recent.get(variant.section) ?? [];
  recent.set(variant.section, [{ key, depth }, ...entries].slice(0, KEPT));
  return depth;
}

/** Depths kept per stored section object (documents are immutable, so the object stands for its geometry). */
const recent = new WeakMap<Section, { key: string; depth: SampledDepth }[]>();
const KEPT = 4;

/**
 * The width at every cell centre of `map`: the profile's widths by monotone cubic interpolation in distance along
 * the port (held beyond the first and last station), constant across the flow, less the obstructions on the valve
 * axis. Example: stations (0, 30) and (100, 40) give 35 wherever the plane flow is halfway along.
 */
export function widthDepth(map: AlongFlowMap, profile: WidthProfile, axis: ValveAxis | undefined): SampledDepth {
  const widthAt = monotoneCubic(profile.stations.map((s) => s.along), profile.stations.map((s) => s.width));
  const values = new Float64Array(map.along.length);
  for (let c = 0; c < values.length; c++) values[c] = widthAt(map.along[c]);
  if (axis !== undefined && profile.obstructions) subtractObstructions(map, values, profile.obstructions, axis);
  return { kind: 'sampled', x0: map.x0 + 0.5 * map.h, y0: map.y0 + 0.5 * map.h, dx: map.h, dy: map.h, nx: map.nx, ny: map.ny, values };
}

/**
 * Within diameter/2 of the valve axis line and between `from` and `to` up it from the gauge-line centre, the width
 * is reduced by the diameter, never below OBSTRUCTED_WIDTH_FLOOR of the width there. Where obstructions overlap
 * (a stem inside its guide boss) the widest one counts: the stem runs through the boss, it is not stacked beside it.
 */
export function subtractObstructions(map: AlongFlowMap, values: Float64Array, obstructions: readonly WidthObstruction[], axis: ValveAxis): void {
  const lean = (axis.inclinationDeg * Math.PI) / 180;
  // The valve opens along (sin, -cos) of its lean; up the stem is the opposite way.
  const upX = -Math.sin(lean), upY = Math.cos(lean);
  for (let j = 0; j < map.ny; j++) {
    for (let i = 0; i < map.nx; i++) {
      const dx = map.x0 + (i + 0.5) * map.h - axis.x, dy = map.y0 + (j + 0.5) * map.h - axis.y;
      const up = dx * upX + dy * upY;
      const across = Math.abs(dx * upY - dy * upX);
      let blocked = 0;
      for (const o of obstructions) {
        if (up >= o.from && up <= o.to && across <= 0.5 * o.diameter) blocked = Math.max(blocked, o.diameter);
      }
      if (blocked === 0) continue;
      const c = i + j * map.nx;
      values[c] = Math.max(values[c] - blocked, OBSTRUCTED_WIDTH_FLOOR * values[c]);
    }
  }
}
