/** The status line: plain-word messages, errors kept visible until the next success. */

export type StatusLevel = 'info' | 'warn' | 'error';

export class StatusLine {
  constructor(private readonly element: HTMLElement) {}

  show(message: string, level: StatusLevel = 'info'): void {
    this.element.textContent = message;
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
