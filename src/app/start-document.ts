/** The document the app starts on (the work kept from the last visit when it still builds, else the sample) in its store. */
import { loadDocument } from '../document/load.ts';
import { applyEdit, EDITS, isEditName } from '../editor/index.ts';
import { restoreAutosave } from './autosave.ts';
import { checkDocument, documentProblem } from './document-check.ts';
import { DocumentStore } from './document-store.ts';
import { clampEdit } from './edit-clamp.ts';
import type { StatusLevel } from './status.ts';

/** The store every change goes through (checked before it lands, named in the undo list), and what to say first. */
export function startStore(sampleText: string): { store: DocumentStore; greeting: { text: string; level: StatusLevel } | null } {
  const restored = restoreAutosave();
  const problem = restored === null ? null : documentProblem(restored);
  const doc = restored !== null && problem === null ? restored : loadDocument(sampleText);
  const store = new DocumentStore(doc, applyEdit, {
    guard: { check: checkDocument, clamp: clampEdit },
    label: (name) => (isEditName(name) ? EDITS[name].label : name),
  });
  if (problem !== null) return { store, greeting: { text: `The work kept from your last visit was not opened: ${problem} The sample is shown instead.`, level: 'error' } };
  if (restored !== null) return { store, greeting: { text: 'Restored the work from your last visit. Open a sample or a file to start afresh.', level: 'info' } };
  return { store, greeting: null };
}
