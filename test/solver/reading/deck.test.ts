/** The deck: past it (the test bore) cells and stations are read and drawn but not judged. */
import { describe, expect, it } from 'vitest';
import { lengthPastDeck, pastDeck } from '../../../src/solver/reading/deck.ts';
import { readFlow } from '../../../src/solver/reading/index.ts';
import type { FlowReading } from '../../../src/solver/reading/types.ts';
import { solveFlow } from '../../../src/solver/solve.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../../src/solver/types.ts';
import type { CutGrid } from '../../../src/solver/types.ts';
import { domainOf, polygonArea, ringOf, type Pt } from '../rasterise/shapes.ts';

/**
 * A port 2 wide (y 5..7) from the inlet at x = 0, ending in a dead pocket at x = 7; below y = 5 (the deck) a bore
 * box x 4..10, y 1..5 whose top right corner is dead water, then a slot 1.5 wide (x 6..7.5) down to the outlet at
 * y = 0: narrower than the port, so without a deck the tightest station is in the slot.
 */
const POINTS: Pt[] = [[0, 5], [4, 5], [4, 1], [6, 1], [6, 0], [7.5, 0], [7.5, 1], [10, 1], [10, 5], [7, 5], [7, 7], [0, 7]];
const MARKS = [MARK_WALL, MARK_WALL, MARK_WALL, MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_WALL, MARK_WALL, MARK_WALL, MARK_WALL, MARK_WALL, MARK_INLET];
const IDS = [0, 1, 1, 1, -1, 1, 1, 1, 2, 3, 4, -1];
const NAMES = ['floor', 'bore wall', 'deck', 'port end', 'roof'];
const DECK = { x: 0, y: 5, normalX: 0, normalY: -1 };

/** Centre y of every marked cell. */
function markedYs(grid: CutGrid, mask: Uint8Array): number[] {
  const ys: number[] = [];
  mask.forEach((m, c) => m && ys.push(grid.y0 + (Math.floor(c / grid.nx) + 0.5) * grid.h));
  return ys;
}

describe('a deck line on a hand-built port over a bore', () => {
  expect(polygonArea(POINTS)).toBeGreaterThan(0); // the outline runs counter-clockwise
  const domain = domainOf(ringOf(POINTS, MARKS, IDS), [], NAMES);
  const result = solveFlow(domain, { targetCells: 40_000 });
  const free: FlowReading = readFlow(domain, result, { streamlineCount: 4 });
  const judged: FlowReading = readFlow(domain, result, { streamlineCount: 4, deck: DECK });

  it('without a deck, flags slow cells and the tightest station in the bore (so the deck has work to do)', () => {
    expect(markedYs(result.grid, free.slow.mask).some((y) => y < 5)).toBe(true);
    expect(free.stations[free.tightest!.index].midY).toBeLessThan(5);
    expect(free.stations.every((s) => s.judged)).toBe(true);
  });

  it('with the deck, marks no cell past it but keeps the port\'s own slow pocket', () => {
    const ys = markedYs(result.grid, judged.slow.mask);
    expect(ys.length).toBeGreaterThan(0);
    expect(Math.min(...ys)).toBeGreaterThan(5);
    // the share counts only the judged part of the section
    const { grid } = result;
    let area = 0, slow = 0;
    grid.cellFraction.forEach((f, c) => {
      if (!(f > 0) || !Number.isFinite(result.speedRatio[c]) || grid.y0 + (Math.floor(c / grid.nx) + 0.5) * grid.h < 5) return;
      area += f;
      if (judged.slow.mask[c]) slow += f;
    });
    expect(judged.slow.share).toBeCloseTo(slow / area, 12);
    expect(judged.slow.largest!.y).toBeGreaterThan(5);
  });

  it('judges a station only when at most half of it lies past the deck; the tightest and over-wide are judged ones', () => {
    for (const s of judged.stations) {
      const past = lengthPastDeck(DECK, s.lines);
      expect(s.judged, `station at phi ${s.phi}`).toBe(past <= 0.5 * s.width);
      const ys = s.lines.flatMap((xy) => Array.from(xy).filter((_, k) => k % 2 === 1));
      if (Math.max(...ys) < 5) expect(s.judged).toBe(false);
      if (Math.min(...ys) > 5) expect(s.judged).toBe(true);
    }
    expect(judged.stations.some((s) => !s.judged)).toBe(true);
    const tightest = judged.stations[judged.tightest!.index];
    expect(tightest.judged).toBe(true);
    expect(tightest.midY).toBeGreaterThan(5);
    for (const o of judged.overWide) expect(judged.stations[o.index].judged).toBe(true);
    expect(judged.findings.find((f) => f.kind === 'tightest')!.y).toBeGreaterThan(5);
  });

  it('leaves the stations themselves, the wall readings and the wall march as they are', () => {
    expect(judged.stations.map(({ judged: _, ...s }) => s)).toEqual(free.stations.map(({ judged: _, ...s }) => s));
    expect(judged.walls).toEqual(free.walls);
    expect(judged.detachments).toEqual(free.detachments);
    expect(judged.streamlines).toEqual(free.streamlines);
  });
});

describe('deck geometry', () => {
  it('measures signed distance past the deck and the exact length of a line past it', () => {
    const deck = { x: 1, y: 2, normalX: 0, normalY: -2 };
    expect(pastDeck(deck, 5, 1)).toBe(2);
    expect(pastDeck(deck, 5, 3)).toBe(-2);
    // a line from y = 3 down to y = -1 along x = 0 crosses the deck at y = 2: 3 of its 4 units lie past it
    expect(lengthPastDeck(deck, [Float64Array.of(0, 3, 0, -1)])).toBeCloseTo(3, 12);
    // a polyline wholly past it counts in full; one wholly before it not at all
    expect(lengthPastDeck(deck, [Float64Array.of(0, 1, 3, 1, 3, -3)])).toBeCloseTo(7, 12);
    expect(lengthPastDeck(deck, [Float64Array.of(0, 4, 3, 4)])).toBe(0);
  });
});
