/** Loader fuzz: damaged samples and fixtures either load to a document that saves and reloads unchanged, or are refused plainly. */

import { readdirSync, readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DocumentError } from '../../src/document/errors.ts';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import { FORMAT_VERSION, type PortDocument } from '../../src/document/types.ts';
import { LOADER_RUNS, SEEDS } from './counts.ts';
import { damage, stepArb } from './file-mutations.ts';

/** Every sample and every fixture, whatever versions they are in. */
function sectionFiles(): string[] {
  const read = (dir: string): string[] => {
    const url = new URL(dir, import.meta.url);
    return readdirSync(url).filter((name) => name.endsWith('.json')).map((name) => readFileSync(new URL(name, `${url.href}/`), 'utf8'));
  };
  return [...read('../../samples'), ...read('../fixtures')];
}

const FILES = sectionFiles();

/** What a message of ours never holds: a fault of the code showing through instead of a problem with the file. */
const NOT_PLAIN = /\[object |TypeError|RangeError|Cannot read|is not a function|\n\s+at /;

/** The outcome of loading one damaged file; throws (failing the case) on anything but the two allowed outcomes. */
function loadOutcome(text: string): 'loaded' | 'refused' {
  let doc: PortDocument;
  try {
    doc = loadDocument(text);
  } catch (error) {
    expect(error, `not a DocumentError: ${String(error)}`).toBeInstanceOf(DocumentError);
    const { message, problems } = error as DocumentError;
    expect(problems.length).toBeGreaterThan(0);
    for (const p of problems) expect(p.problem.trim()).not.toBe('');
    expect(message).not.toMatch(NOT_PLAIN);
    return 'refused';
  }
  expect(doc.version).toBe(FORMAT_VERSION);
  const saved = saveDocument(doc);
  const again = loadDocument(saved);
  expect(again).toStrictEqual(doc);
  expect(saveDocument(again)).toBe(saved);
  return 'loaded';
}

describe(`loader fuzz: ${LOADER_RUNS} damaged section files`, () => {
  it('loads each to a document that saves and reloads unchanged, or refuses it with a DocumentError', () => {
    const seen = { loaded: 0, refused: 0 };
    const cases = fc.record({
      file: fc.nat({ max: FILES.length - 1 }),
      tree: fc.array(stepArb, { maxLength: 3 }),
      bytes: fc.oneof(fc.constant([]), fc.array(stepArb, { minLength: 1, maxLength: 2 })),
      indent: fc.constantFrom(0, 2),
    });
    fc.assert(fc.property(cases, ({ file, tree, bytes, indent }) => {
      seen[loadOutcome(damage(FILES[file], tree, bytes, indent))]++;
      expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    }), { seed: SEEDS.loader, numRuns: LOADER_RUNS });
    expect(seen.loaded + seen.refused).toBe(LOADER_RUNS);
    // Both outcomes are exercised, so neither half of the rule is checked on nothing.
    expect(seen.loaded).toBeGreaterThan(LOADER_RUNS / 20);
    expect(seen.refused).toBeGreaterThan(LOADER_RUNS / 2);
    console.info(`loader fuzz: ${LOADER_RUNS} cases, ${seen.loaded} loaded and round-tripped, ${seen.refused} refused`);
  });
});
