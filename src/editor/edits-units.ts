/** Converts the whole drawing between millimetres and inches (1 in = 25.4 mm exactly, NIST SP 811). */
import { z } from 'zod';
import { unitsSchema } from '../document/schema.ts';
import type { PortDocument, Units } from '../document/types.ts';

export const setUnitsArgs = z.strictObject({ units: unitsSchema });

const MM_PER_INCH = 25.4;

/**
 * Every number in the variants is a length except angles and percentages (keys ending in "Deg" or "Pct") and
 * areas (keys ending in "Area", scaled by the square), by the format's naming rule; so one walk converts outlines,
 * fillets, islands and parts alike. A variant's bench inputs are in SI whatever the drawing's units, so they stay.
 */
export function setUnits(doc: PortDocument, args: { readonly units: Units }): PortDocument {
  if (args.units === doc.units) return doc;
  const factor = args.units === 'inch' ? 1 / MM_PER_INCH : MM_PER_INCH;
  return { ...doc, units: args.units, variants: scaleLengths(doc.variants, factor, '') as PortDocument['variants'] };
}

function scaleLengths(value: unknown, factor: number, key: string): unknown {
  if (key === 'bench') return value;
  if (typeof value === 'number') return /(Deg|Pct)$/.test(key) ? value : /Area$/.test(key) ? value * factor * factor : value * factor;
  if (Array.isArray(value)) return value.map((v) => scaleLengths(v, factor, key));
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, scaleLengths(v, factor, k)]));
  }
  return value;
}
