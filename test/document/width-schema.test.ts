import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import type { WidthProfile } from '../../src/document/types.ts';
import { documentErrorOf } from './document-error.ts';

const tightText = readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8');

/** The tight sample's text with its variant's width profile set (and its parts dropped when `noParts`). */
function withWidth(width: unknown, noParts = false): string {
  const doc = JSON.parse(tightText);
  doc.variants[0].width = width;
  if (noParts) delete doc.variants[0].parts;
  return JSON.stringify(doc);
}

/** Invented: the port 32 to 34 mm wide, the bowl 50 mm round the stem and guide boss. */
const PROFILE: WidthProfile = {
  stations: [{ along: 0, width: 32 }, { along: 50, width: 34 }, { along: 90, width: 50 }],
  obstructions: [{ name: 'valve stem', diameter: 8, from: 10, to: 40 }, { name: 'guide boss', diameter: 14, from: 25, to: 40 }],
};

describe('width profile in the file (format version 5)', () => {
  it('round-trips through save and load exactly, written before the section', () => {
    const doc = loadDocument(withWidth(PROFILE));
    expect(doc.variants[0].width).toStrictEqual(PROFILE);
    const text = saveDocument(doc);
    expect(loadDocument(text)).toStrictEqual(doc);
    expect(text.indexOf('"width"')).toBeLessThan(text.indexOf('"section"'));
  });

  it('takes a profile without obstructions, and an empty obstruction list', () => {
    const stations = PROFILE.stations;
    expect(loadDocument(withWidth({ stations })).variants[0].width).toStrictEqual({ stations });
    expect(loadDocument(withWidth({ stations, obstructions: [] })).variants[0].width).toStrictEqual({ stations, obstructions: [] });
  });

  it('names each bad number by its place, with the bound', () => {
    const cases: [unknown, string][] = [
      [{ stations: [{ along: 0, width: 32 }] }, 'variants[0].width.stations: must be a list of 2 to 200 width stations { along, width } (got a list of 1 item)'],
      [{ stations: [{ along: -1, width: 32 }, { along: 9, width: 32 }] }, 'variants[0].width.stations[0].along: must be a number from 0 to 1000000'],
      [{ stations: [{ along: 0, width: -32 }, { along: 9, width: 32 }] }, 'variants[0].width.stations[0].width: must be a number above 0'],
      [{ stations: [{ along: 5, width: 32 }, { along: 2, width: 32 }] }, 'variants[0].width.stations[1].along: must be further along the port than the station before it (5)'],
      [{ stations: PROFILE.stations, obstructions: [{ name: 'stem', diameter: 0, from: 0, to: 9 }] }, 'variants[0].width.obstructions[0].diameter: must be a number above 0'],
      [{ stations: PROFILE.stations, obstructions: [{ name: 'stem', diameter: 8, from: 9, to: 9 }] }, 'variants[0].width.obstructions[0].to: must be above from (9)'],
      [{ stations: PROFILE.stations, obstructions: [{ name: ' ', diameter: 8, from: 0, to: 9 }] }, 'variants[0].width.obstructions[0].name: must be a name'],
      [{ stations: PROFILE.stations, widths: [] }, 'variants[0].width.widths: is not a field'],
      [{ stations: [{ along: 0, width: 32, depth: 1 }, { along: 9, width: 32 }] }, 'variants[0].width.stations[0].depth: is not a field'],
      [[32, 34], 'variants[0].width: must be a width profile { stations, obstructions }'],
    ];
    for (const [width, expected] of cases) expect(documentErrorOf(() => loadDocument(withWidth(width))).message).toContain(expected);
  });

  it('refuses obstructions on a variant without a valve, saying what to add', () => {
    const { message } = documentErrorOf(() => loadDocument(withWidth(PROFILE, true)));
    expect(message).toContain('variants[0].width.obstructions: need a valve: an obstruction is placed along the valve axis (add parts.valve, or remove the obstructions)');
    expect(loadDocument(withWidth({ stations: PROFILE.stations }, true)).variants[0].width).toStrictEqual({ stations: PROFILE.stations });
  });
});
