/** The status line: plain-word messages in whole sentences, errors kept visible until the next success. */

export type StatusLevel = 'info' | 'warn' | 'error';

/** Ends like a sentence: a full stop, question or exclamation mark, or an ellipsis, maybe inside closing quotes or brackets. */
const SENTENCE_END = /[.!?…]["'”’)\]]*$/;

/** `text` ending as a sentence: a full stop is added when it has none ("(got "cm")" becomes "(got "cm")."). */
export function endSentence(text: string): string {
  const trimmed = text.trim();
  return trimmed === '' || SENTENCE_END.test(trimmed) ? trimmed : `${trimmed}.`;
}

/**
 * Pieces of a message (and the lines of each: a file's problems come one per line) as whole sentences joined by one
 * space, so none runs into the next: sentences('… in double quotes', 'Your work is unchanged.') gives
 * "… in double quotes. Your work is unchanged."
 */
export function sentences(...parts: readonly string[]): string {
  return parts.flatMap((part) => part.split('\n')).map(endSentence).filter((s) => s !== '').join(' ');
}

export class StatusLine {
  constructor(private readonly element: HTMLElement) {}

  /** Shows `message` as whole sentences (an empty message clears the line). */
  show(message: string, level: StatusLevel = 'info'): void {
    this.element.textContent = sentences(message);
    this.element.dataset.level = level;
  }

  clear(): void {
    this.show('');
  }

  /** Clear an error or warning that a later success answers; leave plain information in place. */
  clearErrors(): void {
    if (this.element.dataset.level !== 'info') this.clear();
  }
}
