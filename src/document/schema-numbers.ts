/** Number rules shared by the section schema and the parts schema: a bounded finite number, and a coordinate. */

import { z } from 'zod';
import { MAX_COORDINATE } from './limits.ts';

/** A number from `min` to `max` (inclusive), refused as "must be <requirement>"; z.number() itself refuses NaN and Infinity. */
export function boundedNumber(min: number, max: number, requirement: string) {
  const error = `must be ${requirement}`;
  return z.number({ error }).min(min, { error }).max(max, { error });
}

/** An x or y in document units. */
export const coordinateSchema = boundedNumber(-MAX_COORDINATE, MAX_COORDINATE, `a number from -${MAX_COORDINATE} to ${MAX_COORDINATE}`);
