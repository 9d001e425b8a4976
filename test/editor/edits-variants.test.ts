import { describe, expect, it } from 'vitest';
import { saveDocument } from '../../src/document/load.ts';
import { MAX_NAME_LENGTH } from '../../src/document/limits.ts';
import { applyEdit } from '../../src/editor/edits.ts';
import { boxDocument } from './fixtures.ts';

const names = (doc: { variants: readonly { name: string }[] }) => doc.variants.map((v) => v.name);

describe('variant edits', () => {
  it('adds a copy of the active variant with a fresh name and makes it active', () => {
    const doc = boxDocument();
    const one = applyEdit(doc, 'addVariant', {});
    const two = applyEdit(one, 'setActiveVariant', { name: 'stock' });
    const three = applyEdit(two, 'addVariant', {});
    expect(names(three)).toEqual(['stock', 'opened roof', 'stock copy', 'stock copy 2']);
    expect(three.activeVariant).toBe('stock copy 2');
    expect(three.variants[3].section).toBe(doc.variants[0].section);
    const named = applyEdit(doc, 'addVariant', { name: ' tight short side ' });
    expect(named.activeVariant).toBe('tight short side');
  });

  it('refuses empty and duplicate names', () => {
    const doc = boxDocument();
    expect(() => applyEdit(doc, 'addVariant', { name: '  ' })).toThrow(/needs a name/);
    expect(() => applyEdit(doc, 'addVariant', { name: 'opened roof' })).toThrow(/already a variant called "opened roof"/);
    expect(() => applyEdit(doc, 'renameVariant', { from: 'stock', to: 'opened roof' })).toThrow(/already a variant/);
  });

  it('only makes names the file can hold: one line, and a copy of the longest name cut to fit', () => {
    const doc = boxDocument();
    // Before, both were taken and the document could then not be saved.
    expect(() => applyEdit(doc, 'renameVariant', { from: 'stock', to: 'as\tcast' })).toThrow(/must fit on one line/);
    expect(() => applyEdit(doc, 'addVariant', { name: 'two\nlines' })).toThrow(/must fit on one line/);
    const longest = 'x'.repeat(MAX_NAME_LENGTH);
    const long = { ...doc, variants: [{ ...doc.variants[0], name: longest }, doc.variants[1]], activeVariant: longest };
    const copied = applyEdit(applyEdit(long, 'addVariant', {}), 'setActiveVariant', { name: longest });
    const twice = applyEdit(copied, 'addVariant', {});
    expect(names(twice).slice(2)).toEqual([`${'x'.repeat(MAX_NAME_LENGTH - 5)} copy`, `${'x'.repeat(MAX_NAME_LENGTH - 7)} copy 2`]);
    expect(() => saveDocument(twice)).not.toThrow();
  });

  it('renames a variant and follows it when it is active', () => {
    const doc = boxDocument();
    const renamed = applyEdit(doc, 'renameVariant', { from: 'stock', to: 'as cast' });
    expect(names(renamed)).toEqual(['as cast', 'opened roof']);
    expect(renamed.activeVariant).toBe('as cast');
    expect(renamed.variants[1]).toBe(doc.variants[1]);
    expect(applyEdit(doc, 'renameVariant', { from: 'stock', to: 'stock' })).toBe(doc);
    expect(() => applyEdit(doc, 'renameVariant', { from: 'nope', to: 'x' })).toThrow(/no variant called "nope"/);
  });

  it('switches the active variant', () => {
    const doc = boxDocument();
    expect(applyEdit(doc, 'setActiveVariant', { name: 'opened roof' }).activeVariant).toBe('opened roof');
    expect(applyEdit(doc, 'setActiveVariant', { name: 'stock' })).toBe(doc);
    expect(() => applyEdit(doc, 'setActiveVariant', { name: 'bored out' })).toThrow(/no variant called/);
  });

  it('deletes a variant, never the last, moving the active one to a neighbour', () => {
    const doc = boxDocument();
    const left = applyEdit(doc, 'deleteVariant', { name: 'stock' });
    expect(names(left)).toEqual(['opened roof']);
    expect(left.activeVariant).toBe('opened roof');
    const other = applyEdit(applyEdit(doc, 'setActiveVariant', { name: 'opened roof' }), 'deleteVariant', { name: 'opened roof' });
    expect(other.activeVariant).toBe('stock');
    expect(() => applyEdit(left, 'deleteVariant', { name: 'opened roof' })).toThrow(/only variant; a document keeps at least one/);
  });
});
