/** The zod schema of a variant's width profile (format version 5): stations along the port and obstructions in the bowl. */

import { z } from 'zod';
import { MAX_NAME_LENGTH, MAX_PART_LENGTH, MAX_WIDTH_ALONG, MAX_WIDTH_OBSTRUCTIONS, MAX_WIDTH_STATIONS, CONTROL_CHARACTER } from './limits.ts';
import { boundedNumber, coordinateSchema } from './schema-numbers.ts';

/** A length above zero, document units. */
function positiveLength(what: string) {
  const error = `must be a number above 0 and at most ${MAX_PART_LENGTH} (${what} in the document's units)`;
  return z.number({ error }).gt(0, { error }).max(MAX_PART_LENGTH, { error });
}

const along = boundedNumber(0, MAX_WIDTH_ALONG, `a number from 0 to ${MAX_WIDTH_ALONG} (the distance from the manifold face along the port)`);

export const widthStationSchema = z.strictObject(
  { along, width: positiveLength('the passage width') },
  { error: 'must be a width station { along, width }' },
);

const obstructionName = (() => {
  const error = `must be a name of 1 to ${MAX_NAME_LENGTH} characters on one line`;
  return z.string({ error }).min(1, { error }).max(MAX_NAME_LENGTH, { error })
    .refine((s) => s.trim().length > 0 && !CONTROL_CHARACTER.test(s), { error });
})();

export const widthObstructionSchema = z
  .strictObject(
    { name: obstructionName, diameter: positiveLength('a diameter'), from: coordinateSchema, to: coordinateSchema },
    { error: 'must be an obstruction { name, diameter, from, to }' },
  )
  .superRefine((o, ctx) => {
    if (!(o.from < o.to)) {
      ctx.addIssue({ code: 'custom', path: ['to'], message: `must be above from (${o.from}): the obstruction runs from its lower end up the valve axis to its upper end (got ${o.to})` });
    }
  });

function list<T extends z.ZodType>(item: T, min: number, max: number, what: string) {
  const error = `must be a list of ${min} to ${max} ${what}`;
  return z.array(item, { error }).min(min, { error }).max(max, { error });
}

/** Key order here is the order saveDocument writes. */
export const widthProfileSchema = z
  .strictObject(
    {
      stations: list(widthStationSchema, 2, MAX_WIDTH_STATIONS, 'width stations { along, width }'),
      obstructions: list(widthObstructionSchema, 0, MAX_WIDTH_OBSTRUCTIONS, 'obstructions { name, diameter, from, to }').optional(),
    },
    { error: 'must be a width profile { stations, obstructions }' },
  )
  .superRefine((profile, ctx) => {
    for (let i = 1; i < profile.stations.length; i++) {
      const before = profile.stations[i - 1].along, here = profile.stations[i].along;
      if (!(here > before)) {
        ctx.addIssue({
          code: 'custom',
          path: ['stations', i, 'along'],
          message: `must be further along the port than the station before it (${before}); stations go from the manifold face toward the valve (got ${here})`,
        });
      }
    }
  });

/** An obstruction stands on the valve axis, so a profile with obstructions needs the valve part. */
export function checkWidthObstructions(variant: { width?: z.output<typeof widthProfileSchema>; parts?: { valve?: unknown } }, ctx: z.core.$RefinementCtx): void {
  if ((variant.width?.obstructions?.length ?? 0) > 0 && variant.parts?.valve === undefined) {
    ctx.addIssue({
      code: 'custom',
      path: ['width', 'obstructions'],
      message: 'need a valve: an obstruction is placed along the valve axis (add parts.valve, or remove the obstructions)',
    });
  }
}
