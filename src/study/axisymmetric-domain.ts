/** The flow domain of a round (axisymmetric) variant: the section's kept side of its axis, with the depth b = 2 pi r. */

import type { Variant } from '../document/types.ts';
import { clipToHalfPlane } from '../geometry/half-plane-clip.ts';
import { MARK_INLET, MARK_OUTLET, type FlowDomain, type Ring } from '../solver/types.ts';
import { StudyError } from './errors.ts';

/** The wall name of the cut along the axis (a line of symmetry, not metal). */
export const AXIS_WALL_NAME = 'axis';

/**
 * `plane` (the variant's flattened domain) cut along the variant's axis (its own, or the valve's) and kept on the
 * side its round model names, with `depth` the round depth about that axis. The clip runs on the flattened rings, so
 * it is exact to the grid's flattening tolerance; the cut along the axis is a wall named AXIS_WALL_NAME (the solver's
 * b = 0 there carries no flux either way). Returns `plane` itself for a variant without a round model.
 * Throws StudyError (code 'axis-side') when there is no axis, nothing lies on the kept side, the kept side falls in
 * separate pieces, or the inlet or the outlet lies wholly on the other side.
 */
export function axisymmetricDomain(variant: Variant, plane: FlowDomain): FlowDomain {
  const model = variant.axisymmetric;
  if (model === undefined) return plane;
  const axis = model.axis ?? variant.parts?.valve?.axis;
  if (axis === undefined) {
    throw new StudyError('axis-side', `The variant "${variant.name}" is set to be solved as round, but it has no axis to turn about. Give the round model an axis, or add a valve.`);
  }
  const lean = (axis.inclinationDeg * Math.PI) / 180;
  const openX = Math.sin(lean), openY = -Math.cos(lean);
  // The valve's right (SeatPart.throatOffsetPct's +x side when it opens down) is the opening direction turned a quarter
  // turn counter-clockwise.
  const sign = model.keep === 'right' ? 1 : -1;
  const found = plane.wallNames.indexOf(AXIS_WALL_NAME);
  const wallNames = found >= 0 ? plane.wallNames : [...plane.wallNames, AXIS_WALL_NAME];
  const half = { x: axis.x, y: axis.y, normalX: -openY * sign, normalY: openX * sign };
  const clipped = clipToHalfPlane(plane.outer, plane.islands, half, wallNames.indexOf(AXIS_WALL_NAME));
  const outer = onePiece(clipped.outers, model.keep);
  for (const [mark, name] of [[MARK_INLET, 'inlet (the manifold face)'], [MARK_OUTLET, 'outlet (the far end of the bore)']] as const) {
    if (!outer.marks.includes(mark)) {
      throw new StudyError('axis-side', `The ${name} lies wholly on the other side of the axis from the ${model.keep} side that is solved. Keep the other side, or move the axis.`);
    }
  }
  return {
    outer,
    islands: clipped.holes,
    wallNames,
    depth: { kind: 'axisymmetric', axis: { x: axis.x, y: axis.y, dirX: openX, dirY: openY } },
  };
}

function onePiece(outers: readonly Ring[], keep: string): Ring {
  if (outers.length === 1) return outers[0];
  if (outers.length === 0) {
    throw new StudyError('axis-side', `Nothing of the section lies on the ${keep} side of the axis. Keep the other side, or move the axis.`);
  }
  throw new StudyError('axis-side', `The section's ${keep} side of the axis falls into ${outers.length} separate pieces, and a round section must be one passage. Move the axis so that it cuts the section once across.`);
}
