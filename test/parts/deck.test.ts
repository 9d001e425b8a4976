/** The deck line handed to the flow reading: the top of the generated test bore, the bore below it. */

import { describe, expect, it } from 'vitest';
import { applyParts } from '../../src/parts/apply.ts';
import { deckLine } from '../../src/parts/deck.ts';
import { PARTS_40, VALVE_40, deepFreeze, handDrawnPort } from './helpers.ts';

describe('deck line', () => {
  it('lies on the bore walls\' top ends, with the normal pointing down into the bore', () => {
    const parts = deepFreeze(PARTS_40);
    const deck = deckLine({ parts })!;
    // deck 2 below the gauge line at y = 2 (the seat's recess): y = 0, on the valve axis
    expect(deck).toEqual({ x: 0, y: 0, normalX: 0, normalY: -1 });
    const outline = applyParts(handDrawnPort(), parts).outline;
    const boreWallTops = outline.edges.flatMap((e, i) =>
      e.kind === 'line' && e.wallName?.startsWith('bore wall') ? [outline.vertices[i].at, outline.vertices[(i + 1) % outline.vertices.length].at] : []);
    expect(boreWallTops.length).toBe(4);
    // every bore-wall end is on the deck or past it, and the top ends are on it
    const past = boreWallTops.map(([x, y]) => (x - deck.x) * deck.normalX + (y - deck.y) * deck.normalY);
    for (const d of past) expect(d).toBeGreaterThanOrEqual(-1e-12);
    expect(past.filter((d) => Math.abs(d) < 1e-12)).toHaveLength(2);
  });

  it('is null without a bore part', () => {
    expect(deckLine({})).toBeNull();
    expect(deckLine({ parts: { valve: VALVE_40 } })).toBeNull();
  });
});
