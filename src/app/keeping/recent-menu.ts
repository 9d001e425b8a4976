/** The Recent menu in the top bar: documents opened or worked on lately, by title and time, and set-aside copies. */
import { whenChanged } from './notices.ts';
import type { RecentEntry } from './records.ts';

export interface RecentMenuHooks {
  /** Reopen an entry (as an undoable open, asking first over unsaved work). */
  readonly reopen: (entry: RecentEntry) => void;
  /** Download the set-aside copy kept under `key`. */
  readonly download: (key: string) => void;
  /** ms since 1970. */
  readonly now: () => number;
}

/** The menu under `button`: opened by it, closed by a choice, Escape or a click elsewhere. */
export class RecentMenu {
  private entries: readonly RecentEntry[] = [];
  private asides: ReadonlyArray<{ readonly key: string; readonly setAsideAt: number }> = [];

  constructor(private readonly button: HTMLButtonElement, private readonly list: HTMLElement, private readonly hooks: RecentMenuHooks) {
    button.addEventListener('click', () => (this.isOpen ? this.close() : this.open()));
    list.addEventListener('keydown', (event) => {
      // Keys in the menu are the menu's: an editor shortcut must not act behind it.
      event.stopPropagation();
      if (event.key === 'Escape') {
        this.close();
        button.focus();
      }
      if (event.key === 'ArrowDown' || event.key === 'ArrowUp') {
        event.preventDefault();
        this.moveFocus(event.key === 'ArrowDown' ? 1 : -1);
      }
    });
    document.addEventListener('pointerdown', (event) => {
      if (this.isOpen && !list.contains(event.target as Node) && event.target !== button) this.close();
    });
  }

  get isOpen(): boolean {
    return !this.list.hidden;
  }

  /** The entries to list, newest first, and the set-aside copies (kept as they were; unchanged when not given). */
  show(entries: readonly RecentEntry[], asides = this.asides): void {
    this.entries = entries;
    this.asides = asides;
    const empty = entries.length === 0 && asides.length === 0;
    this.button.disabled = empty;
    this.button.title = empty ? 'No recent documents yet.' : 'Reopen a document opened or worked on lately.';
    if (this.isOpen) this.fill();
  }

  open(): void {
    this.fill();
    this.list.hidden = false;
    // Under the button, moved left as far as needed to stay on screen (the top bar wraps, so it may sit anywhere).
    this.list.style.left = '0px';
    const overflow = this.list.getBoundingClientRect().right - (document.documentElement.clientWidth - 8);
    if (overflow > 0) this.list.style.left = `${-overflow}px`;
    this.button.setAttribute('aria-expanded', 'true');
    this.list.querySelector('button')?.focus();
  }

  close(): void {
    this.list.hidden = true;
    this.button.setAttribute('aria-expanded', 'false');
  }

  /** Focus the next (+1) or previous (-1) item, wrapping round. */
  private moveFocus(step: 1 | -1): void {
    const items = [...this.list.querySelectorAll('button')];
    const at = items.indexOf(document.activeElement as HTMLButtonElement);
    items[(at + step + items.length) % items.length]?.focus();
  }

  private fill(): void {
    const now = this.hooks.now();
    const recent = this.entries.map((entry) =>
      this.item(entry.title || 'Untitled section', `changed ${whenChanged(entry.changedAt, now)}`, () => this.hooks.reopen(entry)));
    const asides = this.asides.map(({ key, setAsideAt }) =>
      this.item('Download the set-aside copy', `set aside ${whenChanged(setAsideAt, now)}`, () => this.hooks.download(key)));
    this.list.replaceChildren(...recent, ...asides);
  }

  private item(label: string, detail: string, choose: () => void): HTMLButtonElement {
    const item = document.createElement('button');
    item.type = 'button';
    item.setAttribute('role', 'menuitem');
    item.className = 'recent-item';
    const title = document.createElement('span');
    title.textContent = label;
    const when = document.createElement('span');
    when.className = 'recent-when';
    when.textContent = detail;
    item.append(title, when);
    item.addEventListener('click', () => {
      this.close();
      choose();
    });
    return item;
  }
}
