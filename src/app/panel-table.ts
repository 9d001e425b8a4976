/** The side panel's small building blocks: a heading and a two-column table of labelled readings. */

/** label, value, and an optional data-reading key tests and scripts can find the value by. */
export type ReadingRow = readonly [string, string, string?];

export function heading(text: string): HTMLElement {
  const h = document.createElement('h3');
  h.textContent = text;
  return h;
}

export function readingTable(rows: readonly ReadingRow[]): HTMLTableElement {
  const t = document.createElement('table');
  for (const [label, value, key] of rows) {
    const tr = t.insertRow();
    tr.insertCell().textContent = label;
    const cell = tr.insertCell();
    cell.textContent = value;
    if (key) cell.dataset.reading = key;
  }
  return t;
}
