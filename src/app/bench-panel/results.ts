/** The bench panel's results list: value rows grouped as air, bench and engine, each with its small print below. */

import type { OutputGroup, OutputRow } from './rows.ts';
import { setLabelText } from './text.ts';

const GROUP_TITLES: Record<OutputGroup, string> = { air: 'Air', bench: 'Bench', engine: 'Engine' };

/** Fills `list` with `rows`; a value that cannot be had shows a dash and what it waits for, never NaN. */
export function renderResults(list: HTMLElement, rows: readonly OutputRow[]): void {
  const doc = list.ownerDocument;
  const make = (tag: string, className: string, text = ''): HTMLElement => {
    const el = doc.createElement(tag);
    el.className = className;
    el.textContent = text;
    return el;
  };
  const nodes: HTMLElement[] = [];
  let group: OutputGroup | null = null;
  for (const row of rows) {
    if (row.group !== group) {
      group = row.group;
      nodes.push(make('h4', 'bench-group', GROUP_TITLES[group]));
    }
    const item = make('div', 'bench-result');
    item.dataset.output = row.key;
    if (row.flag) item.dataset.flag = 'true';
    const label = make('span', 'bench-result-label');
    setLabelText(label, row.label);
    const value = make('span', 'bench-value', row.text ?? '—');
    if (row.text === null) value.dataset.missing = 'true';
    const small = (row.text === null ? row.missing : row.note) ?? '';
    item.append(label, value, make('div', 'bench-note', small));
    nodes.push(item);
  }
  list.replaceChildren(...nodes);
}
