/** applyParts: the section the solver sees, with the valve head, seat rings, deck and test bore generated from the parts. */

import type { Island, Parts, Section, Variant } from '../document/types.ts';
import { PartsError } from './errors.ts';
import { VALVE_ISLAND_NAME, valveIsland } from './valve-head.ts';
import { pocketAnchors, splicePocket } from './anchors.ts';
import { pocketStretch } from './pocket.ts';

/**
 * `section` with its parts' geometry in place (pure; `section` is not changed):
 * - a valve replaces the island named "valve head" (or is added after the others);
 * - a seat and bore replace the outline's valve pocket between the anchor corners (see anchors.ts).
 * Applying the same parts again gives the same section. Throws PartsError when the parts cannot be built.
 */
export function applyParts(section: Section, parts: Parts | undefined): Section {
  if (!parts || (!parts.valve && !parts.seat && !parts.bore)) return section;
  const { valve, seat, bore } = parts;
  if (!valve) throw new PartsError('missing-part', seat ? 'seat' : 'bore', 'A seat or test bore needs a valve to be placed round.');
  if (Boolean(seat) !== Boolean(bore)) {
    throw new PartsError('missing-part', seat ? 'bore' : 'seat', 'The seat and the test bore are generated together; give both.');
  }
  let outline = section.outline;
  if (seat && bore) {
    const anchors = pocketAnchors(outline);
    const from = outline.vertices[anchors.from].at, to = outline.vertices[anchors.to].at;
    outline = splicePocket(outline, anchors, pocketStretch(valve, seat, bore, outline, from, to));
  }
  return { outline, islands: withValve(section.islands, valveIsland(valve)) };
}

function withValve(islands: readonly Island[], valve: Island): Island[] {
  const at = islands.findIndex((island) => island.name === VALVE_ISLAND_NAME);
  if (at < 0) return [...islands, valve];
  return islands.flatMap((island, i) => (i === at ? [valve] : island.name === VALVE_ISLAND_NAME ? [] : [island]));
}

/** The section of `variant` as the solver should see it: its parts regenerated into it (the section itself if none). */
export function sectionForSolver(variant: Variant): Section {
  return applyParts(variant.section, variant.parts);
}
