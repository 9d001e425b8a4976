/** Checks on the traced rings of a section: crossings, and each island inside the outline and clear of the others. */

import { findCrossing, type Crossing } from './crossings.ts';
import { GeometryError, capitalise, formatPoint, outlineLabel } from './errors.ts';
import { pointInRing } from './region.ts';

/** A traced ring with its name: ring 0 is the section outline (no island name), the rest are islands. */
export interface NamedRing {
  /** x0, y0, x1, y1, ... length units, closed. */
  readonly xy: Float64Array;
  /** Per segment: document edge index. */
  readonly edgeOf: Int32Array;
  readonly islandName?: string;
}

/**
 * Throws GeometryError 'self-crossing', 'island-crossing', 'island-outside' or 'island-in-island'.
 * For a crossing, `edgeIndex` / `islandName` name the first ring in order (the section outline when involved)
 * and `otherEdgeIndex` / `otherIslandName` the second.
 */
export function checkRings(rings: readonly NamedRing[], units?: string): void {
  const crossing = findCrossing(rings);
  if (crossing !== null) throw crossingError(crossing, rings, units);
  const outer = rings[0];
  for (let i = 1; i < rings.length; i++) {
    const island = rings[i];
    // No crossings, so one point tells where the whole island is.
    const x = island.xy[0], y = island.xy[1];
    if (!pointInRing(outer.xy, x, y)) {
      throw new GeometryError('island-outside',
        `${capitalise(outlineLabel(island.islandName))} lies outside the section outline; move it inside or delete it.`,
        { where: [x, y], islandName: island.islandName });
    }
    for (let j = 1; j < rings.length; j++) {
      if (j !== i && pointInRing(rings[j].xy, x, y)) {
        throw new GeometryError('island-in-island',
          `${capitalise(outlineLabel(island.islandName))} lies inside ${outlineLabel(rings[j].islandName)}; an island inside solid metal means nothing to the flow, so delete or move it.`,
          { where: [x, y], islandName: island.islandName, otherIslandName: rings[j].islandName });
      }
    }
  }
}

function crossingError(c: Crossing, rings: readonly NamedRing[], units?: string): GeometryError {
  const a = rings[c.ringA], b = rings[c.ringB];
  const at = formatPoint(c.point, units);
  const detail = {
    where: c.point, edgeIndex: c.edgeA, otherEdgeIndex: c.edgeB,
    islandName: a.islandName, otherIslandName: b.islandName,
  };
  if (c.ringA === c.ringB) {
    const label = outlineLabel(a.islandName);
    const message = c.edgeA === c.edgeB
      ? `Edge ${c.edgeA + 1} of ${label} crosses itself at ${at}.`
      : `Edges ${c.edgeA + 1} and ${c.edgeB + 1} of ${label} cross or touch at ${at}.`;
    return new GeometryError('self-crossing', `${message} An outline must not cross itself; move a corner or a curve point.`, detail);
  }
  const message = `${capitalise(outlineLabel(a.islandName))} (edge ${c.edgeA + 1}) and ${outlineLabel(b.islandName)} (edge ${c.edgeB + 1}) cross or touch at ${at}.`;
  return new GeometryError('island-crossing', `${message} Islands must sit clear of the outline and of each other.`, detail);
}
