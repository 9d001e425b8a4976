/** Keeps the current work in the browser's local storage so a closed tab or a crash loses nothing. */
import { loadDocument, saveDocument } from '../document/load.ts';
import type { PortDocument } from '../document/types.ts';

const KEY = 'portwright.autosave';
const DELAY_MS = 800;

/** The document saved by an earlier visit, or null when there is none or it no longer loads. */
export function restoreAutosave(): PortDocument | null {
  try {
    const text = localStorage.getItem(KEY);
    return text ? loadDocument(text) : null;
  } catch {
    return null;
  }
}

/** Returns a function to call on every change; writes at most once per DELAY_MS. */
export function autosaver(): (doc: PortDocument) => void {
  let timer: ReturnType<typeof setTimeout> | undefined;
  return (doc) => {
    clearTimeout(timer);
    timer = setTimeout(() => {
      try {
        localStorage.setItem(KEY, saveDocument(doc));
      } catch {
        // Storage full or disabled: the user still has Save; nothing to do here.
      }
    }, DELAY_MS);
  };
}
