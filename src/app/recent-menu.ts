/** The Recent menu in the top bar: documents opened or worked on lately, by title and time. */
import { whenChanged } from './kept-notices.ts';
import type { RecentEntry } from './kept-records.ts';

export interface RecentMenuHooks {
  /** Reopen an entry (as an undoable open, asking first over unsaved work). */
  readonly reopen: (entry: RecentEntry) => void;
  /** ms since 1970. */
  readonly now: () => number;
}

/** The menu under `button`: opened by it, closed by a choice, Escape or a click elsewhere. */
export class RecentMenu {
  private entries: readonly RecentEntry[] = [];

  constructor(private readonly button: HTMLButtonElement, private readonly list: HTMLElement, private readonly hooks: RecentMenuHooks) {
    button.addEventListener('click', () => (this.isOpen ? this.close() : this.open()));
    list.addEventListener('keydown', (event) => {
      // Keys in the menu are the menu's: an editor shortcut must not act behind it.
      event.stopPropagation();
      if (event.key === 'Escape') {
        this.close();
        button.focus();
      }
    });
    document.addEventListener('pointerdown', (event) => {
      if (this.isOpen && !list.contains(event.target as Node) && event.target !== button) this.close();
    });
  }

  get isOpen(): boolean {
    return !this.list.hidden;
  }

  /** The entries to list, newest first. */
  show(entries: readonly RecentEntry[]): void {
    this.entries = entries;
    this.button.disabled = entries.length === 0;
    this.button.title = entries.length === 0 ? 'No recent documents yet.' : 'Reopen a document opened or worked on lately.';
    if (this.isOpen) this.fill();
  }

  open(): void {
    this.fill();
    this.list.hidden = false;
    this.button.setAttribute('aria-expanded', 'true');
    this.list.querySelector('button')?.focus();
  }

  close(): void {
    this.list.hidden = true;
    this.button.setAttribute('aria-expanded', 'false');
  }

  private fill(): void {
    const now = this.hooks.now();
    this.list.replaceChildren(...this.entries.map((entry) => {
      const item = document.createElement('button');
      item.type = 'button';
      item.setAttribute('role', 'menuitem');
      item.className = 'recent-item';
      const title = document.createElement('span');
      title.textContent = entry.title || 'Untitled section';
      const when = document.createElement('span');
      when.className = 'recent-when';
      when.textContent = `changed ${whenChanged(entry.changedAt, now)}`;
      item.append(title, when);
      item.addEventListener('click', () => {
        this.close();
        this.hooks.reopen(entry);
      });
      return item;
    }));
  }
}
