/** A small in-page question before unsaved work is replaced (window.confirm is blocked in some kiosks and headless browsers). */

import { textButton } from '../text-button.ts';

/** The question's words: the sentence(s) asked, and the two buttons. */
export interface ReplaceQuestion {
  readonly text: string;
  readonly replace?: string;
  readonly keep?: string;
}

/**
 * Shows the question over the page and resolves true for Replace, false for Keep my work (also Escape). Keys
 * pressed while it is open reach its buttons alone. Keep has the focus.
 */
export function askToReplace(question: ReplaceQuestion, host: HTMLElement = document.body): Promise<boolean> {
  return new Promise((resolve) => {
    const backdrop = document.createElement('div');
    backdrop.className = 'replace-backdrop';
    const dialog = document.createElement('div');
    dialog.className = 'replace-dialog';
    dialog.id = 'replace-dialog';
    dialog.setAttribute('role', 'alertdialog');
    dialog.setAttribute('aria-modal', 'true');
    const text = document.createElement('p');
    text.id = 'replace-dialog-text';
    text.textContent = question.text;
    dialog.setAttribute('aria-describedby', text.id);
    const replace = textButton(question.replace ?? 'Replace', 'replace-confirm');
    const keep = textButton(question.keep ?? 'Keep my work', 'replace-keep');
    const buttons = document.createElement('div');
    buttons.className = 'replace-buttons';
    buttons.append(keep, replace);
    dialog.append(text, buttons);
    backdrop.append(dialog);
    // Caught before anything else hears it, wherever the focus is, so an editor shortcut never acts behind it.
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') {
        event.preventDefault();
        close(false);
      }
      if (!dialog.contains(event.target as Node)) event.preventDefault();
      event.stopPropagation();
    };
    const close = (answer: boolean) => {
      document.removeEventListener('keydown', onKey, true);
      backdrop.remove();
      resolve(answer);
    };
    replace.addEventListener('click', () => close(true));
    keep.addEventListener('click', () => close(false));
    document.addEventListener('keydown', onKey, true);
    host.append(backdrop);
    keep.focus();
  });
}
