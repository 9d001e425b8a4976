/** Format version 3's parts and anchor corners: bounds and cross-field rules, each refusal naming its place. */

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import { documentErrorOf } from './document-error.ts';

/** A parsed file, edited freely to break it. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Json = Record<string, any>;
const sampleJson = (): Json => JSON.parse(readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8'));

function refusal(doc: Json): string {
  return documentErrorOf(() => loadDocument(JSON.stringify(doc))).message;
}

describe('parts in a section file', () => {
  it('load and save back byte for byte (the samples carry valve, seat and bore)', () => {
    const text = readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8');
    const doc = loadDocument(text);
    expect(doc.variants[0].parts?.valve?.axis).toEqual({ x: 95, y: 2.3, inclinationDeg: 0 });
    expect(doc.variants[0].section.outline.vertices.filter((v) => v.anchor)).toHaveLength(2);
    expect(saveDocument(doc)).toBe(text);
  });

  it('refuse numbers out of bounds with the place and the rule', () => {
    const cases: [(d: Json) => void, string][] = [
      [(d) => { d.variants[0].parts.valve.diameter = 0; }, 'variants[0].parts.valve.diameter: must be a number above 0'],
      [(d) => { d.variants[0].parts.valve.seatAngleDeg = 90; }, 'variants[0].parts.valve.seatAngleDeg: must be a number above 0 and below 90 (degrees'],
      [(d) => { d.variants[0].parts.valve.axis.inclinationDeg = 80; }, 'variants[0].parts.valve.axis.inclinationDeg: must be a number from -75 to 75'],
      [(d) => { d.variants[0].parts.valve.lift = -1; }, 'variants[0].parts.valve.lift: must be a number from 0'],
      [(d) => { d.variants[0].parts.seat.throatPct = 100; }, 'variants[0].parts.seat.throatPct: must be a number above 0 and below 100'],
      [(d) => { d.variants[0].parts.seat.throatOffsetPct = -101; }, 'variants[0].parts.seat.throatOffsetPct: must be a number from -100 to 100'],
      [(d) => { d.variants[0].parts.bore.depth = 'deep'; }, 'variants[0].parts.bore.depth: must be a number above 0'],
      [(d) => { d.variants[0].parts.port = { tightestArea: -5 }; }, 'variants[0].parts.port.tightestArea: must be a number above 0'],
      [(d) => { d.variants[0].parts.valve.stemLenght = 20; }, 'variants[0].parts.valve.stemLenght: is not a field'],
      [(d) => { delete d.variants[0].parts.valve.stemLength; }, 'variants[0].parts.valve.stemLength: is missing'],
    ];
    for (const [mutate, expected] of cases) {
      const doc = sampleJson();
      mutate(doc);
      expect(refusal(doc)).toContain(expected);
    }
  });

  it('refuse parts that need another part, and a seat without two anchor corners', () => {
    const noValve = sampleJson();
    delete noValve.variants[0].parts.valve;
    expect(refusal(noValve)).toContain('variants[0].parts.seat: needs a valve');
    const noBore = sampleJson();
    delete noBore.variants[0].parts.bore;
    expect(refusal(noBore)).toContain('variants[0].parts.seat: needs parts.bore too');
    const oneAnchor = sampleJson();
    delete oneAnchor.variants[0].section.outline.vertices[5].anchor;
    const message = refusal(oneAnchor);
    expect(message).toContain('variants[0].section.outline.vertices[18].anchor: is one of 1 anchor corners; an outline has none or exactly two');
  });

  it('keep anchor marks to the section outline, and to the value true', () => {
    const onIsland = sampleJson();
    onIsland.variants[0].section.islands[0].outline.vertices[0].anchor = true;
    expect(refusal(onIsland)).toContain('islands[0].outline.vertices[0].anchor: cannot be set on an island');
    const falseMark = sampleJson();
    falseMark.variants[0].section.outline.vertices[0].anchor = false;
    expect(refusal(falseMark)).toContain('outline.vertices[0].anchor: must be true');
    const three = sampleJson();
    three.variants[0].section.outline.vertices[0].anchor = true;
    expect(refusal(three)).toContain('vertices[18].anchor: is one of 3 anchor corners');
  });

  it('allow a valve alone, with no anchors', () => {
    const valveOnly = sampleJson();
    delete valveOnly.variants[0].parts.seat;
    delete valveOnly.variants[0].parts.bore;
    for (const v of valveOnly.variants[0].section.outline.vertices) delete v.anchor;
    expect(loadDocument(JSON.stringify(valveOnly)).variants[0].parts).toEqual({ valve: sampleJson().variants[0].parts.valve });
  });
});
