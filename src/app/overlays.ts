/** What floats over the app (the keys help, the history list, any open dialog): Escape or a click outside closes it. */

export interface Overlay {
  /** The floating element; it is open while it is not `hidden`. */
  readonly element: HTMLElement;
  /** Elements whose clicks are not "outside", e.g. the button that opens and closes the overlay. */
  readonly owners?: readonly HTMLElement[];
  /** Called after the overlay was closed by Escape or a click outside. */
  readonly onClose?: () => void;
}

export class Overlays {
  private readonly overlays: Overlay[] = [];

  /** Listens in the capture phase, so Escape closes an overlay before the editor reads it as "clear the selection". */
  constructor(private readonly root: Document = document) {
    root.addEventListener('keydown', this.onKey, true);
    root.addEventListener('pointerdown', this.onPointer, true);
  }

  add(overlay: Overlay): void {
    this.overlays.push(overlay);
  }

  /** Whether any overlay or dialog is open. */
  anyOpen(): boolean {
    return this.overlays.some((o) => !o.element.hidden) || this.openDialogs().length > 0;
  }

  /** Close every open overlay, and every open dialog that does not refuse its cancel event; true when one was open. */
  closeAll(): boolean {
    let closed = false;
    for (const overlay of this.overlays) {
      if (overlay.element.hidden) continue;
      this.close(overlay);
      closed = true;
    }
    for (const dialog of this.openDialogs()) {
      closed = true;
      // As the browser does for a modal dialog: a listener may refuse (a choice that must be made).
      if (dialog.dispatchEvent(new Event('cancel', { cancelable: true }))) dialog.close();
    }
    return closed;
  }

  dispose(): void {
    this.root.removeEventListener('keydown', this.onKey, true);
    this.root.removeEventListener('pointerdown', this.onPointer, true);
  }

  private readonly onKey = (ev: KeyboardEvent): void => {
    if (ev.key !== 'Escape' || !this.anyOpen()) return;
    this.closeAll();
    ev.preventDefault();
    ev.stopPropagation();
  };

  private readonly onPointer = (ev: PointerEvent): void => {
    const target = ev.target instanceof Node ? ev.target : null;
    for (const overlay of this.overlays) {
      if (overlay.element.hidden || target === null) continue;
      const inside = [overlay.element, ...(overlay.owners ?? [])].some((e) => e.contains(target));
      if (!inside) this.close(overlay);
    }
  };

  private close(overlay: Overlay): void {
    overlay.element.hidden = true;
    overlay.onClose?.();
  }

  /** Open dialogs the browser does not close on Escape itself (those shown with show(), not showModal()). */
  private openDialogs(): HTMLDialogElement[] {
    return [...this.root.querySelectorAll('dialog[open]')].filter((d): d is HTMLDialogElement => d instanceof HTMLDialogElement && !isModal(d));
  }
}

function isModal(dialog: HTMLDialogElement): boolean {
  try {
    return dialog.matches(':modal');
  } catch {
    // A browser without :modal: treat the dialog as one it closes itself.
    return true;
  }
}
