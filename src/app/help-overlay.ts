/** The list of keys and pointer gestures, drawn from the editor's one shortcut table. */
import { POINTER_HINTS, SHORTCUTS } from '../editor/index.ts';

export function fillHelp(overlay: HTMLElement): void {
  const groups = new Map<string, Array<[string, string]>>();
  for (const s of SHORTCUTS) groups.set(s.group, [...(groups.get(s.group) ?? []), [s.key, s.description]]);
  const parts = ['<h2>Keys and pointer</h2>'];
  for (const [group, rows] of groups) {
    parts.push(`<h3>${group}</h3><table>`, ...rows.map(([k, d]) => `<tr><td><kbd>${esc(k)}</kbd></td><td>${esc(d)}</td></tr>`), '</table>');
  }
  parts.push('<h3>Pointer</h3><table>', ...POINTER_HINTS.map((h) => `<tr><td>${esc(h.key)}</td><td>${esc(h.description)}</td></tr>`));
  parts.push('<tr><td>Drag empty space, wheel, pinch</td><td>Pan and zoom the view</td></tr>', '</table>');
  parts.push('<p>Press <kbd>?</kbd> or <kbd>Escape</kbd> to close.</p>');
  overlay.innerHTML = parts.join('');
}

function esc(text: string): string {
  return text.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c] ?? c);
}
