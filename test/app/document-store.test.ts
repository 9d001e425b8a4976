/** The store checks every change before it lands, clamps a too-big fillet drag, and keeps a drag as one undo step. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { checkDocument, DocumentCheckError, DocumentShapeError, documentProblem, plainMessage } from '../../src/app/document-check.ts';
import { DocumentStore } from '../../src/app/document-store.ts';
import { clampEdit } from '../../src/app/edit-clamp.ts';
import { summariseVariant } from '../../src/cli/section-summary.ts';
import { loadDocument } from '../../src/document/load.ts';
import type { PortDocument, Section } from '../../src/document/types.ts';
import { activeSection, applyEdit, EDITS, isEditName } from '../../src/editor/index.ts';

const SAMPLE = loadDocument(readFileSync(new URL('../../samples/short-side-compare.json', import.meta.url), 'utf8'));

function newStore(doc: PortDocument = SAMPLE): DocumentStore {
  return new DocumentStore(doc, applyEdit, {
    guard: { check: checkDocument, clamp: clampEdit },
    label: (name) => (isEditName(name) ? EDITS[name].label : name),
  });
}

/** The filleted corner between the two "short side" edges of a section. */
function shortSideCorner(section: Section): number {
  const { vertices, edges } = section.outline;
  const n = vertices.length;
  const named = (k: number) => edges[(k + n) % n].role === 'wall' && edges[(k + n) % n].wallName === 'short side';
  const k = vertices.findIndex((v, i) => named(i - 1) && named(i) && (v.filletRadius ?? 0) > 0);
  if (k < 0) throw new Error('no short-side corner');
  return k;
}

const radiusOf = (doc: PortDocument, vertex: number) => activeSection(doc).outline.vertices[vertex].filletRadius ?? 0;

/** What `portwright check` reports for every variant of `doc`: no problem anywhere is what a saved file needs. */
function checkProblems(doc: PortDocument): string[] {
  return doc.variants.flatMap((v) => summariseVariant(v, doc).problems);
}

describe('the store refuses what cannot be solved', () => {
  const vertex = shortSideCorner(activeSection(SAMPLE));

  it('a typed fillet radius too big for its corner is refused with the largest that fits; nothing changes', () => {
    const store = newStore();
    let error: unknown;
    try {
      store.edit('setFilletRadius', { vertex, radius: 40.8 });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(DocumentCheckError);
    expect(plainMessage(error)).toMatch(/does not fit: at most [\d.]+ mm fits.*The change was not made\./);
    expect(store.doc).toBe(SAMPLE);
    expect(store.steps(5).undo).toEqual([]);
  });

  it('a drag past the largest fillet that fits holds the radius there, says why, and the result passes check', () => {
    const store = newStore();
    store.edit('setFilletRadius', { vertex, radius: 10 }, 'drag');
    const note = store.edit('setFilletRadius', { vertex, radius: 40.8 }, 'drag');
    store.endDrag();
    const held = radiusOf(store.doc, vertex);
    expect(held).toBeGreaterThan(10);
    expect(held).toBeLessThan(40.8);
    expect(note).toMatch(/held at [\d.]+ mm, the largest that fits/);
    expect(checkProblems(store.doc)).toEqual([]);
    // The largest that fits: a hair more does not.
    expect(() => checkDocument(applyEdit(store.doc, 'setFilletRadius', { vertex, radius: held * 1.001 }))).toThrow(DocumentCheckError);
    expect(store.steps(5).undo).toEqual(['Set fillet radius']);
  });

  it('a drag step that makes the outline cross itself is refused and the last valid document stays', () => {
    const store = newStore();
    const corner = activeSection(SAMPLE).outline.vertices[vertex].at;
    store.edit('movePoint', { point: { kind: 'vertex', vertex }, to: [corner[0] + 0.5, corner[1]] }, 'drag');
    const valid = store.doc;
    expect(() => store.edit('movePoint', { point: { kind: 'vertex', vertex }, to: [corner[0] - 500, corner[1] + 500] }, 'drag')).toThrow(DocumentCheckError);
    expect(store.doc).toBe(valid);
    store.endDrag();
    expect(checkProblems(store.doc)).toEqual([]);
  });

  it('a file with a variant that does not build is refused by name and the current work stays', () => {
    const store = newStore();
    store.edit('setFilletRadius', { vertex, radius: 6 });
    const work = store.doc;
    const other = SAMPLE.variants[1].name;
    const broken = applyEdit({ ...SAMPLE, activeVariant: other }, 'setFilletRadius', { vertex: shortSideCorner(SAMPLE.variants[1].section), radius: 60 });
    expect(() => store.replace(broken, 'Open "broken.json"')).toThrow(`the variant "${other}" cannot be solved. The fillet at corner`);
    expect(store.doc).toBe(work);
    expect(store.steps(5).undo).toEqual(['Set fillet radius']);
  });

  it('a document Save would refuse is never committed, even when every variant builds (one anchor corner left)', () => {
    const store = newStore();
    const section = activeSection(store.doc);
    const k = section.outline.vertices.findIndex((v) => v.anchor);
    const vertices = section.outline.vertices.map((v, i) => (i === k ? { at: v.at } : v));
    const oneAnchor = { ...store.doc, variants: store.doc.variants.map((v) => (v.name === store.doc.activeVariant ? { ...v, parts: undefined, section: { ...v.section, outline: { ...v.section.outline, vertices } } } : v)) };
    const work = store.doc;
    let thrown: unknown;
    try {
      store.replace(oneAnchor as PortDocument, 'Open "one-anchor.json"');
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(DocumentShapeError);
    expect(plainMessage(thrown)).toMatch(/^The result would not save as a valid section file \(variants\[\d\]\.section\.outline\.vertices\[\d+\]\.anchor is one of 1 anchor corners; .*\)\. The change was not made\.$/);
    expect(store.doc).toBe(work);
  });
});

describe('undo and redo in the store', () => {
  const vertex = shortSideCorner(activeSection(SAMPLE));

  it('a whole drag is one step: undo gives back the very document before it, redo the one at release', () => {
    const store = newStore();
    for (let r = 4.5; r <= 12; r += 0.5) store.edit('setFilletRadius', { vertex, radius: r }, 'drag');
    expect(store.undo()).toBeNull();
    store.endDrag();
    const released = store.doc;
    expect(radiusOf(released, vertex)).toBe(12);
    expect(store.steps(5).undo).toEqual(['Set fillet radius']);
    expect(store.undo()).toBe('Set fillet radius');
    expect(store.doc).toBe(SAMPLE);
    expect(store.redo()).toBe('Set fillet radius');
    expect(store.doc).toBe(released);
  });

  it('a cancelled drag goes back to where it started and leaves no step', () => {
    const store = newStore();
    store.edit('setFilletRadius', { vertex, radius: 9 }, 'drag');
    store.cancelDrag();
    expect(store.doc).toBe(SAMPLE);
    expect(store.steps(5).undo).toEqual([]);
  });

  it('edits, units and an opened file are steps; listeners hear undo and redo as history', () => {
    const store = newStore();
    const causes: string[] = [];
    // Listeners see the history as it is after the change (the Undo button names the step just made).
    const heard: string[] = [];
    store.subscribe((_doc, cause) => {
      causes.push(cause);
      heard.push(store.steps(1).undo[0] ?? '');
    });
    store.edit('setLift', { lift: 8 });
    store.edit('setUnits', { units: 'inch' }, 'open');
    const inches = store.doc;
    store.replace(SAMPLE, 'Open "sample.json"');
    expect(store.steps(5).undo).toEqual(['Open "sample.json"', 'Change units', 'Set lift']);
    store.undo();
    expect(store.doc).toBe(inches);
    store.undo();
    store.undo();
    expect(store.doc).toBe(SAMPLE);
    expect(store.steps(5).redo).toEqual(['Set lift', 'Change units', 'Open "sample.json"']);
    // Undoing an opened file or a change of units brings back a whole document, shown afresh as an opened one is.
    expect(causes).toEqual(['edit', 'open', 'open', 'open', 'open', 'history']);
    expect(heard).toEqual(['Set lift', 'Change units', 'Open "sample.json"', 'Change units', 'Set lift', '']);
  });
});

describe('the nearest valid value of a refused step', () => {
  const vertex = shortSideCorner(activeSection(SAMPLE));
  const refusal = (doc: PortDocument): unknown => {
    try {
      checkDocument(doc);
    } catch (error) {
      return error;
    }
    throw new Error('expected the document to be refused');
  };

  it('exists only for the fillet radius of the very corner that does not fit', () => {
    const tooBig = applyEdit(SAMPLE, 'setFilletRadius', { vertex, radius: 40.8 });
    const error = refusal(tooBig);
    const clamped = clampEdit(SAMPLE, 'setFilletRadius', { vertex, radius: 40.8 }, error);
    expect(clamped).not.toBeNull();
    expect((clamped!.args as { radius: number }).radius).toBeLessThan(40.8);
    // Another corner's radius, a moved point or another kind of problem has no nearest value: refused outright.
    expect(clampEdit(SAMPLE, 'setFilletRadius', { vertex: vertex + 1, radius: 40.8 }, error)).toBeNull();
    expect(clampEdit(SAMPLE, 'movePoint', { point: { kind: 'vertex', vertex }, to: [0, 0] }, error)).toBeNull();
    expect(clampEdit(SAMPLE, 'setFilletRadius', { vertex, radius: 40.8 }, new Error('other'))).toBeNull();
  });

  it('a whole document that does not build is named by variant for the status line', () => {
    expect(documentProblem(SAMPLE)).toBeNull();
    const broken = applyEdit(SAMPLE, 'setFilletRadius', { vertex, radius: 40.8 });
    expect(documentProblem(broken)).toMatch(new RegExp(`^The variant "${SAMPLE.activeVariant}" cannot be solved\\. The fillet at corner ${vertex + 1} `));
  });
});
