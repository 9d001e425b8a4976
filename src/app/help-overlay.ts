/** The list of keys and pointer gestures, drawn from the editor's one shortcut table (built as elements, never markup). */
import { POINTER_HINTS, SHORTCUTS } from '../editor/index.ts';

/** Fills `overlay` with the keys and gestures; its Close button hides it (Escape and a click outside do too). */
export function fillHelp(overlay: HTMLElement): void {
  const groups = new Map<string, Array<[string, string]>>();
  for (const s of SHORTCUTS) groups.set(s.group, [...(groups.get(s.group) ?? []), [s.key, s.description]]);
  const close = make('button', 'Close');
  close.type = 'button';
  close.className = 'help-close';
  close.addEventListener('click', () => (overlay.hidden = true));
  const parts: HTMLElement[] = [close, make('h2', 'Keys and pointer')];
  for (const [group, rows] of groups) parts.push(make('h3', group), table(rows, true));
  const pointer: Array<[string, string]> = POINTER_HINTS.map((h) => [h.key, h.description]);
  pointer.push(['Drag empty space, wheel, pinch', 'Pan and zoom the view']);
  parts.push(make('h3', 'Pointer'), table(pointer, false));
  const hint = make('p', 'Press ');
  hint.append(make('kbd', '?'), ' or ', make('kbd', 'Escape'), ', or click outside this list, to close it.');
  parts.push(hint);
  overlay.replaceChildren(...parts);
  overlay.setAttribute('role', 'dialog');
  overlay.setAttribute('aria-label', 'Keys and pointer');
}

function table(rows: ReadonlyArray<[string, string]>, keys: boolean): HTMLTableElement {
  const t = document.createElement('table');
  for (const [key, description] of rows) {
    const tr = t.insertRow();
    const first = tr.insertCell();
    if (keys) first.append(make('kbd', key));
    else first.textContent = key;
    tr.insertCell().textContent = sentence(description);
  }
  return t;
}

/** A description shown as a sentence: first letter upper case, a full stop at the end. */
export function sentence(text: string): string {
  const trimmed = text.trim();
  if (trimmed === '') return trimmed;
  const capital = trimmed.charAt(0).toUpperCase() + trimmed.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

function make<K extends keyof HTMLElementTagNameMap>(tag: K, text: string): HTMLElementTagNameMap[K] {
  const element = document.createElement(tag);
  element.textContent = text;
  return element;
}
