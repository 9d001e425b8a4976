/** The zod schema of a variant's round (axisymmetric) model (format version 5): an optional axis and the side kept. */

import { z } from 'zod';
import { boundedNumber, coordinateSchema } from './schema-numbers.ts';

/** Any direction in the plane: a half turn either way from straight down. */
const direction = boundedNumber(-180, 180, 'a number from -180 to 180 (degrees the axis leans counter-clockwise from straight down)');

export const axisymmetricAxisSchema = z.strictObject(
  { x: coordinateSchema, y: coordinateSchema, inclinationDeg: direction },
  { error: 'must be an axis { x, y, inclinationDeg }' },
);

/** Key order here is the order saveDocument writes. */
export const axisymmetricSchema = z.strictObject(
  {
    axis: axisymmetricAxisSchema.optional(),
    keep: z.enum(['left', 'right'], { error: 'must be "left" or "right" (the side of the axis that is solved)' }),
  },
  { error: 'must be a round model { axis, keep }' },
);

interface AxisymmetricVariant {
  readonly axisymmetric?: z.output<typeof axisymmetricSchema>;
  readonly width?: unknown;
  readonly parts?: { readonly valve?: unknown };
}

/** A round model needs an axis (its own or the valve's) and cannot be mixed with a width profile. */
export function checkAxisymmetric(variant: AxisymmetricVariant, ctx: z.core.$RefinementCtx): void {
  const model = variant.axisymmetric;
  if (model === undefined) return;
  if (variant.width !== undefined) {
    ctx.addIssue({
      code: 'custom',
      path: ['axisymmetric'],
      message: 'cannot be set together with a width profile: a round section takes its depth from the axis (remove one of the two)',
    });
  }
  if (model.axis === undefined && variant.parts?.valve === undefined) {
    ctx.addIssue({
      code: 'custom',
      path: ['axisymmetric', 'axis'],
      message: 'is needed: the variant has no valve whose axis the section could turn about (give an axis, or add parts.valve)',
    });
  }
}
