/** The saved state in the top bar: whether the work is kept in this browser, in whole sentences. */
import type { SavedState } from './autosave.ts';

/** The words for a saved state. */
export function savedStateText(state: SavedState): string {
  switch (state.kind) {
    case 'idle': return 'Changes are kept in this browser.';
    case 'saved': return 'Saved in this browser.';
    case 'saving': return 'Saving…';
    case 'failed': return `Not saved: ${state.reason}. Use Save to keep a file.`;
  }
}

/** Shows `state` in `element` (its data-state for the colour, the whole sentence also as its tooltip). */
export function showSavedState(element: HTMLElement, state: SavedState): void {
  const text = savedStateText(state);
  element.textContent = text;
  element.title = text;
  element.dataset.state = state.kind;
}
