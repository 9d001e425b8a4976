/** The edit of a variant's round (axisymmetric) model: solve it as round about an axis, keeping one side. */

import { z } from 'zod';
import { axisymmetricSchema } from '../document/axisymmetric-schema.ts';
import type { AxisymmetricModel, PortDocument } from '../document/types.ts';
import { EditError } from './errors.ts';
import { namedOrActiveVariant, withVariantKey } from './section-access.ts';

export const setAxisymmetricArgs = z.strictObject({
  /** The round model (axis in document units, or left out for the valve's axis); null solves the variant plane again. */
  axisymmetric: axisymmetricSchema.nullable(),
  /** The variant that changes; the active one when left out. */
  variant: z.string().optional(),
});
export type SetAxisymmetricArgs = z.infer<typeof setAxisymmetricArgs>;

/**
 * Sets (or removes) one variant's round model. Refused for a variant with a width profile (a round section takes its
 * depth from the axis) and, without an axis of its own, for a variant with no valve. Returns `doc` itself when the
 * model is the same number for number (no undo step).
 */
export function setAxisymmetric(doc: PortDocument, { axisymmetric, variant }: SetAxisymmetricArgs): PortDocument {
  const edit = 'setAxisymmetric';
  const { index, variant: before } = namedOrActiveVariant(doc, variant, edit);
  const model = axisymmetric === null ? undefined : tidy(axisymmetric);
  if (model !== undefined && before.width !== undefined) {
    throw new EditError(edit, `The variant "${before.name}" has a width profile, and a round section takes its depth from the axis instead. Remove the width profile first.`);
  }
  if (model !== undefined && model.axis === undefined && before.parts?.valve === undefined) {
    throw new EditError(edit, `The variant "${before.name}" has no valve whose axis it could turn about. Give the round model an axis, or add a valve.`);
  }
  return sameAxisymmetric(before.axisymmetric, model) ? doc : withVariantKey(doc, index, 'axisymmetric', model);
}

function tidy(model: AxisymmetricModel): AxisymmetricModel {
  if (model.axis === undefined) return { keep: model.keep };
  const { x, y, inclinationDeg } = model.axis;
  return { axis: { x, y, inclinationDeg }, keep: model.keep };
}

/** The same model: the same side and the same axis number for number (both absent counts as the same). */
export function sameAxisymmetric(a: AxisymmetricModel | undefined, b: AxisymmetricModel | undefined): boolean {
  if (a === undefined || b === undefined) return a === b;
  if (a.keep !== b.keep) return false;
  if (a.axis === undefined || b.axis === undefined) return a.axis === b.axis;
  return Object.is(a.axis.x, b.axis.x) && Object.is(a.axis.y, b.axis.y) && Object.is(a.axis.inclinationDeg, b.axis.inclinationDeg);
}
