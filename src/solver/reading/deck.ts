/** Which side of the deck a point or a station lies on: the test bore past the deck is read but not judged. */
import type { DeckLine } from './types.ts';

/** Signed distance of (x, y) past the deck, in units of the normal's length: > 0 in the bore, <= 0 in the head. */
export function pastDeck(deck: DeckLine, x: number, y: number): number {
  return (x - deck.x) * deck.normalX + (y - deck.y) * deck.normalY;
}

/**
 * Length of polylines (x0, y0, x1, y1, ... document units) that lies past the deck: each segment is cut where it
 * crosses the deck line, so the answer is exact for straight pieces.
 */
export function lengthPastDeck(deck: DeckLine, lines: readonly Float64Array[]): number {
  let sum = 0;
  for (const xy of lines) {
    for (let k = 0; k + 3 < xy.length; k += 2) {
      const a = pastDeck(deck, xy[k], xy[k + 1]), b = pastDeck(deck, xy[k + 2], xy[k + 3]);
      if (a <= 0 && b <= 0) continue;
      const length = Math.hypot(xy[k + 2] - xy[k], xy[k + 3] - xy[k + 1]);
      sum += a > 0 && b > 0 ? length : (length * Math.max(a, b)) / (Math.abs(a) + Math.abs(b));
    }
  }
  return sum;
}
