import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument, readDocument, saveDocument } from '../../src/document/load.ts';
import { MIGRATIONS } from '../../src/document/migrations.ts';
import { FORMAT_VERSION } from '../../src/document/types.ts';
import { documentErrorOf } from './document-error.ts';

const fixture = (name: string): string => readFileSync(new URL(`../fixtures/${name}`, import.meta.url), 'utf8');

describe('format version 1', () => {
  it('migrates through versions 2, 3 and 4 to the expected current document (golden files)', () => {
    const { document, fileVersion } = readDocument(fixture('section-v1.json'));
    expect(fileVersion).toBe(1);
    expect(document).toStrictEqual(loadDocument(fixture('section-v1-as-v2.json')));
    expect(document).toStrictEqual(loadDocument(fixture('section-v1-as-v3.json')));
    expect(document).toStrictEqual(loadDocument(fixture('section-v1-as-v4.json')));
    expect(document).toStrictEqual(loadDocument(fixture('section-v1-as-v5.json')));
  });

  it('saves as version 5, byte for byte the golden file', () => {
    expect(saveDocument(loadDocument(fixture('section-v1.json')))).toBe(fixture('section-v1-as-v5.json'));
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
  it('migrates through versions 3 and 4 unchanged but for the version (golden files)', () => {
    const { document, fileVersion } = readDocument(fixture('section-v1-as-v2.json'));
    expect(fileVersion).toBe(2);
    expect(document.version).toBe(5);
    expect(document.variants.every((v) => v.parts === undefined && v.bench === undefined && v.width === undefined)).toBe(true);
    expect(saveDocument(document)).toBe(fixture('section-v1-as-v5.json'));
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

describe('format version 3', () => {
  it('migrates to version 5 unchanged but for the version (golden files: a sample as version 3 wrote it)', () => {
    const { document, fileVersion } = readDocument(fixture('section-v3.json'));
    expect(fileVersion).toBe(3);
    expect(document).toStrictEqual(loadDocument(fixture('section-v3-as-v4.json')));
    const asWritten = JSON.parse(fixture('section-v3.json'));
    expect({ ...document }).toStrictEqual({ ...asWritten, version: 5 });
  });

  it('keeps its grid detail', () => {
    const v3 = JSON.parse(fixture('section-v3.json'));
    v3.settings.gridDetail = 'fine';
    expect(loadDocument(JSON.stringify(v3)).settings.gridDetail).toBe('fine');
  });

  it('is refused when it has bench inputs mixed in, naming the field', () => {
    const v3 = JSON.parse(fixture('section-v3.json'));
    v3.variants[0].bench = { testPressurePa: 6974.4892 };
    expect(documentErrorOf(() => loadDocument(JSON.stringify(v3))).message).toContain('variants[0].bench: is not a field');
  });
});

describe('format version 4', () => {
  it('migrates to version 5 unchanged but for the version (golden files: a sample as version 4 wrote it)', () => {
    const { document, fileVersion } = readDocument(fixture('section-v4.json'));
    expect(fileVersion).toBe(4);
    expect(document).toStrictEqual(loadDocument(fixture('section-v4-as-v5.json')));
    expect(saveDocument(document)).toBe(fixture('section-v4-as-v5.json'));
    const asWritten = JSON.parse(fixture('section-v4.json'));
    expect({ ...document }).toStrictEqual({ ...asWritten, version: 5 });
    expect(document.variants.every((v) => v.width === undefined)).toBe(true);
  });

  it('is refused when it has a width profile mixed in, naming the field', () => {
    const v4 = JSON.parse(fixture('section-v4.json'));
    v4.variants[0].width = { stations: [{ along: 0, width: 32 }, { along: 60, width: 34 }] };
    expect(documentErrorOf(() => loadDocument(JSON.stringify(v4))).message).toContain('variants[0].width: is not a field');
  });
});

describe('the migration chain', () => {
  it('has one step per older version, in order', () => {
    expect(MIGRATIONS.map((m) => m.from)).toEqual(Array.from({ length: FORMAT_VERSION - 1 }, (_, i) => i + 1));
  });
});
