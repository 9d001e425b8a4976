/**
 * The zod schema of a variant's parametric parts (format version 3): per-field bounds with plain requirements,
 * and the rules that tie the parts together and to the outline's anchor corners.
 * Geometry that only shows when the parts are built (a throat wider than the seat, a head too thin) is checked
 * where it is built, in src/parts, not here: a file stays loadable while its parts are being changed.
 */

import { z } from 'zod';
import type { Outline } from './types.ts';
import { MAX_PART_LENGTH, MAX_PORT_AREA, MAX_VALVE_INCLINATION_DEG } from './limits.ts';
import { boundedNumber, coordinateSchema } from './schema-numbers.ts';

function number(error: string) {
  return z.number({ error });
}

/** A length above zero (a diameter, a width). */
function positiveLength() {
  const error = `must be a number above 0 and at most ${MAX_PART_LENGTH} (a length in the document's units)`;
  return number(error).gt(0, { error }).max(MAX_PART_LENGTH, { error });
}

/** A length of zero or more (a margin, a lift, a clearance). */
function lengthFromZero() {
  return boundedNumber(0, MAX_PART_LENGTH, `a number from 0 to ${MAX_PART_LENGTH} (a length in the document's units)`);
}

/** An angle strictly between 0 and 90 degrees from the plane of the valve head. */
function cutAngle() {
  const error = 'must be a number above 0 and below 90 (degrees from the plane of the valve head)';
  return number(error).gt(0, { error }).lt(90, { error });
}

const lean = MAX_VALVE_INCLINATION_DEG;
const inclination = boundedNumber(-lean, lean, `a number from -${lean} to ${lean} (degrees the opening direction leans from straight down)`);

export const valveAxisSchema = z.strictObject(
  { x: coordinateSchema, y: coordinateSchema, inclinationDeg: inclination },
  { error: 'must be a valve axis { x, y, inclinationDeg }' },
);

export const valvePartSchema = z.strictObject(
  {
    diameter: positiveLength(),
    seatAngleDeg: cutAngle(),
    seatFaceWidth: positiveLength(),
    margin: lengthFromZero(),
    backCutAngleDeg: cutAngle(),
    headThickness: positiveLength(),
    stemDiameter: positiveLength(),
    stemLength: positiveLength(),
    axis: valveAxisSchema,
    lift: lengthFromZero(),
  },
  { error: 'must be a valve { diameter, seatAngleDeg, seatFaceWidth, margin, backCutAngleDeg, headThickness, stemDiameter, stemLength, axis, lift }' },
);

const throatPct = (() => {
  const error = 'must be a number above 0 and below 100 (the throat diameter as a percentage of the valve diameter)';
  return number(error).gt(0, { error }).lt(100, { error });
})();

const throatOffsetPct = boundedNumber(-100, 100, 'a number from -100 to 100 (percent of the throat radius)');

export const seatPartSchema = z.strictObject(
  {
    throatPct,
    seatWidth: positiveLength(),
    topCutAngleDeg: cutAngle(),
    bottomCutAngleDeg: cutAngle(),
    throatOffsetPct,
    recess: lengthFromZero(),
  },
  { error: 'must be a seat { throatPct, seatWidth, topCutAngleDeg, bottomCutAngleDeg, throatOffsetPct, recess }' },
);

export const borePartSchema = z.strictObject(
  { diameter: positiveLength(), depth: positiveLength(), valveEdgeToWall: lengthFromZero() },
  { error: 'must be a test bore { diameter, depth, valveEdgeToWall }' },
);

const portArea = (() => {
  const error = `must be a number above 0 and at most ${MAX_PORT_AREA} (an area in the document's units squared)`;
  return number(error).gt(0, { error }).max(MAX_PORT_AREA, { error });
})();

export const portPartSchema = z.strictObject({ tightestArea: portArea }, { error: 'must be port numbers { tightestArea }' });

export const partsSchema = z.strictObject(
  {
    valve: valvePartSchema.optional(),
    seat: seatPartSchema.optional(),
    bore: borePartSchema.optional(),
    port: portPartSchema.optional(),
  },
  { error: 'must be parts { valve, seat, bore, port } (each optional)' },
);

type PartsShape = z.output<typeof partsSchema>;

/** Ties the parts to each other and to the outline: what needs what, and the two anchor corners a seat needs. */
export function checkParts(parts: PartsShape, outline: Outline, ctx: z.core.$RefinementCtx): void {
  const issue = (path: (string | number)[], message: string): void => {
    ctx.addIssue({ code: 'custom', path: ['parts', ...path], message });
  };
  if (parts.seat && !parts.valve) issue(['seat'], 'needs a valve: the seat is cut round the valve axis (add parts.valve)');
  if (parts.bore && !parts.valve) issue(['bore'], 'needs a valve: the test bore is placed from the valve edge (add parts.valve)');
  if (Boolean(parts.seat) !== Boolean(parts.bore)) {
    const [has, lacks] = parts.seat ? ['seat', 'bore'] : ['bore', 'seat'];
    issue([has], `needs parts.${lacks} too: the seat, deck and test bore are generated together between the outline's anchor corners`);
  }
  const anchors = outline.vertices.filter((v) => v.anchor).length;
  if ((parts.seat || parts.bore) && anchors !== 2) {
    issue(
      [parts.seat ? 'seat' : 'bore'],
      `needs two anchor corners on the section outline (found ${anchors}): mark the corners where the bowl meets the throat on either side with "anchor": true`,
    );
  }
}
