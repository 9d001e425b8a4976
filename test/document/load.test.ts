import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { loadDocument, readDocument, saveDocument } from '../../src/document/load.ts';
import { MAX_FILE_BYTES } from '../../src/document/limits.ts';
import { FORMAT_VERSION, type PortDocument } from '../../src/document/types.ts';
import { documentArb } from './arbitraries.ts';
import { documentErrorOf } from './document-error.ts';

const samplePath = (name: string) => new URL(`../../samples/${name}`, import.meta.url);
const SAMPLES = ['street-tight-short-side.json', 'street-generous-short-side.json', 'short-side-compare.json'];
const tight = (): PortDocument => loadDocument(readFileSync(samplePath(SAMPLES[0]), 'utf8'));

describe('save then load', () => {
  it.each(SAMPLES)('gives back the same document and the same text for %s', (name) => {
    const text = readFileSync(samplePath(name), 'utf8');
    const doc = loadDocument(text);
    expect(loadDocument(saveDocument(doc))).toEqual(doc);
    expect(saveDocument(doc)).toBe(text);
  });

  it('gives back a deep-equal document for generated valid documents', () => {
    fc.assert(
      fc.property(documentArb, (doc) => {
        const again = loadDocument(saveDocument(doc));
        expect(again).toStrictEqual(doc);
        expect(saveDocument(again)).toBe(saveDocument(doc));
      }),
      { numRuns: 300 },
    );
  });

  it('writes the same text whatever order the fields were in', () => {
    const doc = tight();
    const reordered = Object.fromEntries(Object.entries(doc).reverse()) as unknown as PortDocument;
    expect(saveDocument(reordered)).toBe(saveDocument(doc));
  });

  it('does not hand back objects shared with the input', () => {
    const doc = tight();
    const text = saveDocument(doc);
    const a = loadDocument(text), b = loadDocument(text);
    expect(a.variants[0]).not.toBe(b.variants[0]);
  });

  it('refuses to save an invalid document, naming the field', () => {
    const doc = tight();
    const broken = { ...doc, activeVariant: 'no such variant' };
    expect(documentErrorOf(() => saveDocument(broken)).message).toContain('activeVariant: must name one of the variants');
  });
});

describe('problems are named by their place in the file', () => {
  const withVertex = (patch: Record<string, unknown>): string => {
    const doc = JSON.parse(saveDocument(tight()));
    Object.assign(doc.variants[0].section.outline.vertices[3], patch);
    return JSON.stringify(doc);
  };

  it('says the path, the rule and what was found', () => {
    const error = documentErrorOf(() => loadDocument(withVertex({ filletRadius: 'abc' })));
    expect(error.message).toBe('variants[0].section.outline.vertices[3].filletRadius: must be a number >= 0 and <= 100000 (got "abc")');
    expect(error.problems).toEqual([
      { path: 'variants[0].section.outline.vertices[3].filletRadius', problem: 'must be a number >= 0 and <= 100000 (got "abc")' },
    ]);
  });

  it('refuses NaN and Infinity given as strings and as overflowing numbers', () => {
    expect(documentErrorOf(() => loadDocument(withVertex({ filletRadius: 'NaN' }))).message).toContain('(got "NaN")');
    expect(documentErrorOf(() => loadDocument(withVertex({ filletRadius: 'Infinity' }))).message).toContain('(got "Infinity")');
    const overflow = withVertex({ filletRadius: 7 }).replace('"filletRadius":7', '"filletRadius":1e999');
    expect(documentErrorOf(() => loadDocument(overflow)).message).toContain('vertices[3].filletRadius: must be a number >= 0 and <= 100000 (got Infinity)');
  });

  it('refuses unknown fields instead of dropping them', () => {
    const error = documentErrorOf(() => loadDocument(withVertex({ filetRadius: 4 })));
    expect(error.message).toContain('variants[0].section.outline.vertices[3].filetRadius: is not a field');
  });

  it('says when a field is missing', () => {
    const doc = JSON.parse(saveDocument(tight()));
    delete doc.units;
    expect(documentErrorOf(() => loadDocument(JSON.stringify(doc))).message).toBe('units: is missing; it must be "mm" or "inch"');
  });

  it('lists several problems, at most five, then how many more', () => {
    const doc = JSON.parse(saveDocument(tight()));
    for (const v of doc.variants[0].section.outline.vertices) v.at = 'here';
    const error = documentErrorOf(() => loadDocument(JSON.stringify(doc)));
    expect(error.problems).toHaveLength(21);
    expect(error.message.split('\n')).toHaveLength(6);
    expect(error.message).toContain('... and 16 more problems');
  });
});

describe('what is not a current section file', () => {
  const base = (): Record<string, unknown> => JSON.parse(saveDocument(tight()));

  it('names the JSON syntax error position', () => {
    const text = saveDocument(tight()).replace('"units": "mm",', '"units": "mm"');
    const line = text.split('\n').findIndex((l) => l.includes('"activeVariant"')) + 1;
    expect(documentErrorOf(() => loadDocument(text)).message).toBe(
      `not valid JSON at line ${line}, column 3: expected ',' or '}' after a field`,
    );
  });

  it('says a file of another kind is not a Portwright section file', () => {
    const other = { ...base(), format: 'drawing' };
    expect(documentErrorOf(() => loadDocument(JSON.stringify(other))).message).toContain('not a Portwright section file');
    expect(documentErrorOf(() => loadDocument('[1, 2, 3]')).message).toContain('not a Portwright section file');
    expect(documentErrorOf(() => loadDocument('{"title": "x"}')).message).toContain('format: is missing: this is not a Portwright section file');
  });

  it('refuses a file from a newer version, saying so', () => {
    const newer = { ...base(), version: FORMAT_VERSION + 1 };
    const message = documentErrorOf(() => loadDocument(JSON.stringify(newer))).message;
    expect(message).toContain(`format version ${FORMAT_VERSION + 1}`);
    expect(message).toContain('newer Portwright');
  });

  it('refuses versions that are not whole numbers from 1', () => {
    for (const version of [0, -1, 1.5, '2', null]) {
      const message = documentErrorOf(() => loadDocument(JSON.stringify({ ...base(), version }))).message;
      expect(message).toMatch(/^version: must be a whole number from 1 up/);
    }
  });

  it('refuses text over 5 MB, counting UTF-8 bytes', () => {
    // 1.7 million three-byte characters: under the limit in characters, over it in bytes.
    const text = `{"title": "${'\u2500'.repeat(1_700_000)}"}`;
    expect(text.length).toBeLessThan(MAX_FILE_BYTES);
    expect(documentErrorOf(() => loadDocument(text)).message).toMatch(/^the file is too big \(5\.1 MB\)/);
    expect(documentErrorOf(() => loadDocument(' '.repeat(MAX_FILE_BYTES + 1))).message).toContain('too big');
  });

  it('reads a file just under the size limit', () => {
    const text = saveDocument(tight());
    const padded = text + ' '.repeat(MAX_FILE_BYTES - text.length);
    expect(readDocument(padded).document).toEqual(tight());
  });
});
