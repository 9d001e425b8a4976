/** Notices under the top bar about kept work: the offer to keep working on it, and a copy set aside. */
import type { KeptWork } from './records.ts';
import { textButton } from '../text-button.ts';

/** When something changed, in words: "today at 21:40" or "3 Dec 2026 at 21:40" (the browser's own time format). */
export function whenChanged(at: number, now: number): string {
  const date = new Date(at);
  const time = date.toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });
  if (new Date(now).toDateString() === date.toDateString()) return `today at ${time}`;
  return `${date.toLocaleDateString([], { day: 'numeric', month: 'short', year: 'numeric' })} at ${time}`;
}

/** The offer's question, e.g. 'Keep working on "Street intake" (changed today at 21:40)?'. */
export function offerText(work: KeptWork, now: number): string {
  return `Keep working on "${work.title || 'your section'}" (changed ${whenChanged(work.changedAt, now)})?`;
}

/**
 * Asks whether to keep working on the kept work (already shown) or start from the sample; the notice goes once
 * either is chosen. Returns a function that takes the notice away without a choice (another file was opened).
 */
export function offerKeptWork(host: HTMLElement, work: KeptWork, now: number, choices: { keep: () => void; sample: () => void }): () => void {
  const notice = noticeElement('kept-offer', offerText(work, now));
  const keep = textButton('Keep', 'kept-keep');
  const sample = textButton('Start from the sample', 'kept-sample');
  notice.append(keep, sample);
  const dismiss = () => notice.remove();
  keep.addEventListener('click', () => {
    dismiss();
    choices.keep();
  });
  sample.addEventListener('click', () => {
    dismiss();
    choices.sample();
  });
  host.append(notice);
  return dismiss;
}

/** Says that kept work was set aside, with a button that downloads the set-aside copy (when there is one). */
export function showSetAside(host: HTMLElement, message: string, download: (() => void) | null): void {
  const notice = noticeElement('set-aside-notice', message);
  notice.dataset.level = 'warn';
  if (download) {
    const save = textButton('Download the set-aside copy', 'set-aside-download');
    save.addEventListener('click', download);
    notice.append(save);
  }
  const close = textButton('Close', 'set-aside-close');
  close.addEventListener('click', () => notice.remove());
  notice.append(close);
  host.append(notice);
}

function noticeElement(id: string, text: string): HTMLElement {
  const notice = document.createElement('div');
  notice.className = 'notice';
  notice.id = id;
  notice.setAttribute('role', 'status');
  const words = document.createElement('span');
  words.className = 'notice-text';
  words.textContent = text;
  notice.append(words);
  return notice;
}
