/** Trade symbols in the bench panel's labels: "C_D" is printed as C with a subscript D. */

/** Fills `el` with `text`, turning each letter_subscript pair (C_D, C_i) into a letter and a <sub>. */
export function setLabelText(el: HTMLElement, text: string): void {
  const doc = el.ownerDocument;
  const parts = text.split(/\b([A-Za-z])_([A-Za-z0-9]+)\b/);
  const nodes: Node[] = [];
  for (let i = 0; i < parts.length; i += 3) {
    if (parts[i]) nodes.push(doc.createTextNode(parts[i]));
    if (i + 2 < parts.length) {
      const sub = doc.createElement('sub');
      sub.textContent = parts[i + 2];
      nodes.push(doc.createTextNode(parts[i + 1]), sub);
    }
  }
  el.replaceChildren(...nodes);
}
