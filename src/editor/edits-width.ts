/** The edit of a variant's width profile: the passage width at stations along the port, and stems or bosses in the bowl. */

import { z } from 'zod';
import { widthProfileSchema } from '../document/width-schema.ts';
import type { PortDocument, WidthProfile } from '../document/types.ts';
import { EditError } from './errors.ts';
import { namedOrActiveVariant, withVariantKey } from './section-access.ts';

export const setWidthProfileArgs = z.strictObject({
  /** The new profile (document units); null removes it, so the variant is solved per unit depth again. */
  width: widthProfileSchema.nullable(),
  /** The variant whose profile changes; the active one when left out. */
  variant: z.string().optional(),
});
export type SetWidthProfileArgs = z.infer<typeof setWidthProfileArgs>;

/**
 * Sets (or removes) one variant's width profile. An empty obstruction list is left out, as the file never holds an
 * empty placeholder. Returns `doc` itself when the profile is the same number for number (no undo step).
 */
export function setWidthProfile(doc: PortDocument, { width, variant }: SetWidthProfileArgs): PortDocument {
  const edit = 'setWidthProfile';
  const { index, variant: before } = namedOrActiveVariant(doc, variant, edit);
  const profile = width === null ? undefined : tidy(width);
  if (profile?.obstructions && before.parts?.valve === undefined) {
    throw new EditError(edit, `An obstruction stands on the valve axis, so the variant "${before.name}" needs a valve before it can take one.`);
  }
  if (profile !== undefined && before.axisymmetric !== undefined) {
    throw new EditError(edit, `The variant "${before.name}" is solved as round, which takes its depth from the axis. Set it back to a plane section before giving it a width profile.`);
  }
  return sameWidthProfile(before.width, profile) ? doc : withVariantKey(doc, index, 'width', profile);
}

function tidy(width: WidthProfile): WidthProfile {
  const stations = width.stations.map(({ along, width: w }) => ({ along, width: w }));
  if (!width.obstructions || width.obstructions.length === 0) return { stations };
  const obstructions = width.obstructions.map(({ name, diameter, from, to }) => ({ name, diameter, from, to }));
  return { stations, obstructions };
}

/** The same profile: the same stations and obstructions in the same order, number for number (both absent counts as the same). */
export function sameWidthProfile(a: WidthProfile | undefined, b: WidthProfile | undefined): boolean {
  if (a === undefined || b === undefined) return a === b;
  const oa = a.obstructions ?? [], ob = b.obstructions ?? [];
  return a.stations.length === b.stations.length
    && a.stations.every((s, i) => Object.is(s.along, b.stations[i].along) && Object.is(s.width, b.stations[i].width))
    && oa.length === ob.length
    && oa.every((o, i) => o.name === ob[i].name && Object.is(o.diameter, ob[i].diameter) && Object.is(o.from, ob[i].from) && Object.is(o.to, ob[i].to));
}
