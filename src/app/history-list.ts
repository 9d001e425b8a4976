/**
 * The History button of the top bar and its list: the steps that can be redone and undone, newest first, with the
 * current position marked. A click on a step undoes or redoes to it, one store undo or redo per step.
 */
import type { DocumentStore } from './document-store.ts';
import { textButton } from './text-button.ts';

/** Steps listed on each side of the current position. */
export const HISTORY_LISTED = 12;

export interface HistoryList {
  readonly button: HTMLButtonElement;
  /** The popover; open while not hidden. */
  readonly popover: HTMLElement;
  /** List the steps again (after any committed change, or an undo or redo). */
  refresh(): void;
}

/** Puts the History button after `anchor`; `say` puts a sentence in the status line. */
export function mountHistoryList(anchor: HTMLElement, store: DocumentStore, say: (message: string) => void): HistoryList {
  const button = textButton('History', 'history-button');
  button.title = 'The last changes: undo or redo several at once';
  button.setAttribute('aria-haspopup', 'true');
  button.setAttribute('aria-controls', 'history-list');
  const popover = document.createElement('div');
  popover.id = 'history-list';
  popover.className = 'history-popover';
  popover.setAttribute('role', 'dialog');
  popover.setAttribute('aria-label', 'History of changes');
  popover.hidden = true;
  anchor.after(button);
  document.body.append(popover);

  const list: HistoryList = {
    button,
    popover,
    refresh: () => {
      button.setAttribute('aria-expanded', String(!popover.hidden));
      if (!popover.hidden) fill(popover, store, jump);
    },
  };
  const jump = (direction: 'undo' | 'redo', count: number) => {
    say(travel(store, direction, count));
    list.refresh();
  };
  button.addEventListener('click', () => {
    popover.hidden = !popover.hidden;
    if (!popover.hidden) place(popover, button);
    list.refresh();
  });
  return list;
}

/** Undo or redo `count` steps, one store call each; the sentence to show. Stops early if the store refuses. */
export function travel(store: Pick<DocumentStore, 'undo' | 'redo'>, direction: 'undo' | 'redo', count: number): string {
  const labels: string[] = [];
  for (let k = 0; k < count; k++) {
    const label = direction === 'undo' ? store.undo() : store.redo();
    if (label === null) break;
    labels.push(label);
  }
  const last = labels.at(-1);
  if (last === undefined) return direction === 'undo' ? 'Nothing to undo.' : 'Nothing to redo.';
  if (labels.length === 1) return direction === 'undo' ? `Undone: ${last}.` : `Redone: ${last}.`;
  return direction === 'undo'
    ? `Undone ${labels.length} steps, back to before ${last}.`
    : `Redone ${labels.length} steps, up to ${last}.`;
}

/** The list, newest first: the steps that can be redone (the furthest first), the current position, then the done steps. */
function fill(popover: HTMLElement, store: DocumentStore, jump: (direction: 'undo' | 'redo', count: number) => void): void {
  const { undo, redo } = store.steps(HISTORY_LISTED);
  const heading = document.createElement('h3');
  heading.textContent = 'History';
  const list = document.createElement('ol');
  redo.forEach((label, k) => list.prepend(stepItem(label, 'redo', k + 1, jump)));
  const now = document.createElement('li');
  now.className = 'history-now';
  now.setAttribute('aria-current', 'step');
  now.textContent = undo.length + redo.length === 0 ? 'No changes yet.' : 'Now';
  list.append(now);
  undo.forEach((label, k) => list.append(stepItem(label, 'undo', k + 1, jump)));
  popover.replaceChildren(heading, list);
}

function stepItem(label: string, direction: 'undo' | 'redo', count: number, jump: (direction: 'undo' | 'redo', count: number) => void): HTMLLIElement {
  const item = document.createElement('li');
  item.className = direction === 'undo' ? 'history-done' : 'history-undone';
  const button = document.createElement('button');
  button.type = 'button';
  // Names come from the document (a file name, a variant name): always text, never markup.
  button.textContent = label;
  button.dataset.direction = direction;
  button.dataset.count = String(count);
  button.title = direction === 'undo'
    ? (count === 1 ? 'Undo this step.' : `Undo this step and the ${count - 1} after it.`)
    : (count === 1 ? 'Redo this step.' : `Redo the ${count - 1} steps before it, then this one.`);
  button.addEventListener('click', () => jump(direction, count));
  item.append(button);
  return item;
}

/** Under its button, kept on screen. */
function place(popover: HTMLElement, button: HTMLElement): void {
  const r = button.getBoundingClientRect();
  popover.style.top = `${Math.round(r.bottom + 4)}px`;
  popover.style.left = `${Math.round(Math.max(8, Math.min(r.left, window.innerWidth - 368)))}px`;
}
