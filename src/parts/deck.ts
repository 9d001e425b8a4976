/** The deck line: the plane where the flow bench's test bore meets the head, as the flow reading needs it. */

import type { Variant } from '../document/types.ts';
import { deckLevel } from './seat.ts';

/**
 * A line in section coordinates (document units) and the unit normal pointing off it into the test bore. Plain
 * numbers, the same shape as the flow reading's DeckLine, so it can be handed over as it is.
 */
export interface DeckLine {
  /** A point on the deck: on the valve axis, at deck level. */
  readonly x: number;
  readonly y: number;
  /** Unit normal pointing into the bore (down the cylinder axis). */
  readonly normalX: number;
  readonly normalY: number;
}

/**
 * The deck of `variant`: the top of the generated test bore (see boreBox), whose walls run along y, so the deck is
 * level and the bore lies below it. Null when the variant has no bore part (or no valve and seat to place one by,
 * which applyParts refuses anyway).
 */
export function deckLine(variant: Pick<Variant, 'parts'>): DeckLine | null {
  const parts = variant.parts;
  if (!parts?.bore || !parts.valve || !parts.seat) return null;
  return { x: parts.valve.axis.x, y: deckLevel(parts.valve, parts.seat), normalX: 0, normalY: -1 };
}
