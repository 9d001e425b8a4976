/**
 * Which text boxes are being typed in: from the first keystroke until the box commits (its change event) or loses
 * focus. Such a box keeps the browser's own undo; a committed or untouched one leaves undo to the document.
 */

/** Whether keys pressed in `element` belong to it (a text box, a list, editable text) rather than to the page. */
export function isTextBox(element: HTMLElement): boolean {
  return element.isContentEditable || ['INPUT', 'SELECT', 'TEXTAREA'].includes(element.tagName);
}

export class TypedBoxes {
  private readonly dirty = new WeakSet<EventTarget>();
  private readonly onInput = (ev: Event): void => {
    if (ev.target) this.dirty.add(ev.target);
  };
  private readonly onDone = (ev: Event): void => {
    if (ev.target) this.dirty.delete(ev.target);
  };

  constructor(private readonly root: Document = document) {
    root.addEventListener('input', this.onInput, true);
    root.addEventListener('change', this.onDone, true);
    root.addEventListener('focusout', this.onDone, true);
  }

  /** True while `box` holds typing that has not been committed. */
  typing(box: EventTarget): boolean {
    return this.dirty.has(box);
  }

  dispose(): void {
    this.root.removeEventListener('input', this.onInput, true);
    this.root.removeEventListener('change', this.onDone, true);
    this.root.removeEventListener('focusout', this.onDone, true);
  }
}
