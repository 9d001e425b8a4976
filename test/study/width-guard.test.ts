/** A width profile through the app's store: the check before a change lands refuses a profile the file cannot hold, in plain words. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { checkDocument, plainMessage } from '../../src/app/document-check.ts';
import { DocumentStore } from '../../src/app/document-store.ts';
import { sentences } from '../../src/app/status.ts';
import { loadDocument } from '../../src/document/load.ts';
import type { PortDocument } from '../../src/document/types.ts';
import { applyEdit } from '../../src/editor/edits.ts';

const sample = (): PortDocument => loadDocument(readFileSync(new URL('../../samples/street-port-widths.json', import.meta.url), 'utf8'));
const store = (doc: PortDocument, apply = applyEdit) => new DocumentStore(doc, apply, { guard: { check: checkDocument } });

/** The message the status line would show for what `attempt` throws. */
function shown(attempt: () => unknown): string {
  try {
    attempt();
  } catch (error) {
    return sentences(plainMessage(error));
  }
  throw new Error('expected the change to be refused');
}

describe('a width profile through the checked store', () => {
  it('takes a good profile, and removes it again with null', () => {
    const s = store(sample());
    const width = { stations: [{ along: 0, width: 33 }, { along: 150, width: 88 }] };
    s.edit('setWidthProfile', { width });
    expect(s.doc.variants[0].width).toStrictEqual(width);
    s.edit('setWidthProfile', { width: null });
    expect(s.doc.variants[0].width).toBeUndefined();
  });

  it('refuses stations out of order with a sentence naming the place', () => {
    const s = store(sample());
    const message = shown(() => s.edit('setWidthProfile', { width: { stations: [{ along: 10, width: 33 }, { along: 5, width: 34 }] } }));
    expect(message).toBe('The value of width.stations[1].along was refused: must be further along the port than the station before it (10); stations go from the manifold face toward the valve (got 5).');
    expect(s.doc).toStrictEqual(sample());
  });

  it('refuses a document whose profile the file cannot hold, however the change was made', () => {
    const bad = (doc: PortDocument): PortDocument => ({ ...doc, variants: [{ ...doc.variants[0], width: { stations: [{ along: 0, width: -1 }, { along: 9, width: 30 }] } }] });
    const s = store(sample(), (doc) => bad(doc));
    const message = shown(() => s.edit('anything', {}));
    expect(message).toMatch(/^The result would not save as a valid section file \(variants\[0\]\.width\.stations\[0\]\.width must be a number above 0 .*\)\. The change was not made\.$/);
  });

  it('refuses taking the valve away while obstructions stand on its axis, and says what to do', () => {
    const s = store(sample());
    const message = shown(() => s.edit('removeParts', {}));
    expect(message).toContain('variants[0].width.obstructions need a valve: an obstruction is placed along the valve axis (add parts.valve, or remove the obstructions)');
    expect(message.endsWith('The change was not made.')).toBe(true);
  });
});
