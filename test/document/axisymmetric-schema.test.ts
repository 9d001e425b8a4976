import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import { documentErrorOf } from './document-error.ts';

const tightText = readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8');

/** The tight sample's text with its variant's round model set (and its parts dropped when `noParts`). */
function withRound(axisymmetric: unknown, noParts = false, width?: unknown): string {
  const doc = JSON.parse(tightText);
  doc.variants[0].axisymmetric = axisymmetric;
  if (width !== undefined) doc.variants[0].width = width;
  if (noParts) delete doc.variants[0].parts;
  return JSON.stringify(doc);
}

describe('round (axisymmetric) model in the file (format version 5)', () => {
  it('round-trips through save and load exactly, with or without an axis of its own, written just before the section', () => {
    for (const model of [{ keep: 'left' }, { axis: { x: 95, y: 2.3, inclinationDeg: -120 }, keep: 'right' }]) {
      const doc = loadDocument(withRound(model));
      expect(doc.variants[0].axisymmetric).toStrictEqual(model);
      const text = saveDocument(doc);
      expect(loadDocument(text)).toStrictEqual(doc);
      expect(text.indexOf('"axisymmetric"')).toBeLessThan(text.indexOf('"section"'));
      expect(text.indexOf('"axisymmetric"')).toBeGreaterThan(text.indexOf('"parts"'));
    }
  });

  it('names each bad value by its place', () => {
    const cases: [unknown, string][] = [
      [{ keep: 'up' }, 'variants[0].axisymmetric.keep: must be "left" or "right" (the side of the axis that is solved)'],
      [{}, 'variants[0].axisymmetric.keep: is missing; it must be "left" or "right"'],
      [{ axis: { x: 1, y: 2, inclinationDeg: 181 }, keep: 'left' }, 'variants[0].axisymmetric.axis.inclinationDeg: must be a number from -180 to 180'],
      [{ axis: { x: 1, y: 2 }, keep: 'left' }, 'variants[0].axisymmetric.axis.inclinationDeg: is missing; it must be a number from -180 to 180'],
      [{ axis: { x: 1, y: 2, inclinationDeg: 0, dirX: 1 }, keep: 'left' }, 'variants[0].axisymmetric.axis.dirX: is not a field'],
      [{ keep: 'left', side: 'left' }, 'variants[0].axisymmetric.side: is not a field'],
      [true, 'variants[0].axisymmetric: must be a round model { axis, keep }'],
    ];
    for (const [model, expected] of cases) expect(documentErrorOf(() => loadDocument(withRound(model))).message).toContain(expected);
  });

  it('refuses a round model without any axis: no axis of its own and no valve', () => {
    const { message } = documentErrorOf(() => loadDocument(withRound({ keep: 'left' }, true)));
    expect(message).toContain('variants[0].axisymmetric.axis: is needed: the variant has no valve whose axis the section could turn about (give an axis, or add parts.valve)');
    const own = { axis: { x: 95, y: 2.3, inclinationDeg: 0 }, keep: 'left' };
    expect(loadDocument(withRound(own, true)).variants[0].axisymmetric).toStrictEqual(own);
  });

  it('refuses a round model together with a width profile', () => {
    const width = { stations: [{ along: 0, width: 32 }, { along: 50, width: 34 }] };
    const { message } = documentErrorOf(() => loadDocument(withRound({ keep: 'left' }, false, width)));
    expect(message).toContain('variants[0].axisymmetric: cannot be set together with a width profile: a round section takes its depth from the axis (remove one of the two)');
  });
});
