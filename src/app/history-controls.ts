/** The Undo and Redo buttons of the top bar (each naming its steps in its tooltip) and the History list beside them. */
import type { DocumentStore } from './document-store.ts';
import { mountHistoryList, travel, type HistoryList } from './history-list.ts';

/** Steps named in a button's tooltip. */
const LISTED = 12;

export interface HistoryControls {
  /** Undo one step and say which (or that there is nothing to undo). */
  undo(): void;
  redo(): void;
  /** Show the buttons' state and the list again (after any committed change). */
  refresh(): void;
  /** The History button and its list of steps. */
  readonly list: HistoryList;
}

/** `say` puts a sentence in the status line. */
export function mountHistoryControls(undoButton: HTMLButtonElement, redoButton: HTMLButtonElement, store: DocumentStore, say: (message: string) => void): HistoryControls {
  const list = mountHistoryList(redoButton, store, say);
  const controls: HistoryControls = {
    undo: () => say(travel(store, 'undo', 1)),
    redo: () => say(travel(store, 'redo', 1)),
    refresh: () => {
      const { undo, redo } = store.steps(LISTED);
      show(undoButton, undo, 'Undo', 'Ctrl+Z', 'Nothing to undo');
      show(redoButton, redo, 'Redo', 'Ctrl+Shift+Z or Ctrl+Y', 'Nothing to redo');
      list.refresh();
    },
    list,
  };
  undoButton.addEventListener('click', controls.undo);
  redoButton.addEventListener('click', controls.redo);
  controls.refresh();
  return controls;
}

/** The history list lives in the tooltip: the next step first, then the ones after it. */
function show(button: HTMLButtonElement, labels: readonly string[], verb: string, keys: string, none: string): void {
  button.disabled = labels.length === 0;
  button.dataset.steps = String(labels.length);
  if (labels.length === 0) {
    button.title = `${none} (${keys}).`;
    return;
  }
  const [next, ...later] = labels;
  const list = later.length > 0 ? `\nthen: ${later.join('; ')}` : '';
  button.title = `${verb} ${next} (${keys})${list}`;
}
