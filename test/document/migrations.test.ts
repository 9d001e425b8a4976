import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument, readDocument, saveDocument } from '../../src/document/load.ts';
import { MIGRATIONS } from '../../src/document/migrations.ts';
import { FORMAT_VERSION } from '../../src/document/types.ts';
import { documentErrorOf } from './document-error.ts';

const fixture = (name: string): string => readFileSync(new URL(`../fixtures/${name}`, import.meta.url), 'utf8');

describe('format version 1', () => {
  it('migrates through version 2 to the expected current document (golden files)', () => {
    const { document, fileVersion } = readDocument(fixture('section-v1.json'));
    expect(fileVersion).toBe(1);
    expect(document).toStrictEqual(loadDocument(fixture('section-v1-as-v2.json')));
    expect(document).toStrictEqual(loadDocument(fixture('section-v1-as-v3.json')));
  });

  it('saves as version 3, byte for byte the golden file', () => {
    expect(saveDocument(loadDocument(fixture('section-v1.json')))).toBe(fixture('section-v1-as-v3.json'));
  });

  it('names problems by their place in the version-1 file', () => {
    const v1 = JSON.parse(fixture('section-v1.json'));
    v1.section.outline.vertices[2].filletRadius = -1;
    v1.variants = [];
    const { message } = documentErrorOf(() => loadDocument(JSON.stringify(v1)));
    expect(message).toContain('section.outline.vertices[2].filletRadius: must be a number >= 0');
    expect(message).toContain('variants: is not a field');
  });

  it('is refused when it has a version-2 field mixed in', () => {
    const v1 = { ...JSON.parse(fixture('section-v1.json')), activeVariant: 'base' };
    expect(() => loadDocument(JSON.stringify(v1))).toThrow('activeVariant: is not a field');
  });
});

describe('format version 2', () => {
  it('migrates to version 3 unchanged but for the version (golden file)', () => {
    const { document, fileVersion } = readDocument(fixture('section-v1-as-v2.json'));
    expect(fileVersion).toBe(2);
    expect(document.version).toBe(3);
    expect(document.variants.every((v) => v.parts === undefined)).toBe(true);
    expect(saveDocument(document)).toBe(fixture('section-v1-as-v3.json'));
  });

  it('is refused when it has version-3 fields mixed in, naming each', () => {
    const v2 = JSON.parse(fixture('section-v1-as-v2.json'));
    v2.variants[0].parts = {};
    v2.variants[0].section.outline.vertices[1].anchor = true;
    const message = documentErrorOf(() => loadDocument(JSON.stringify(v2))).message;
    expect(message).toContain('variants[0].parts: is not a field');
    expect(message).toContain('variants[0].section.outline.vertices[1].anchor: is not a field');
  });
});

describe('the migration chain', () => {
  it('has one step per older version, in order', () => {
    expect(MIGRATIONS.map((m) => m.from)).toEqual(Array.from({ length: FORMAT_VERSION - 1 }, (_, i) => i + 1));
  });
});
