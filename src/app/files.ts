/** Open and save section files: file picker, download, drag-and-drop onto the page. The current work is kept on any error. */
import { loadDocument, saveDocument } from '../document/load.ts';
import type { PortDocument } from '../document/types.ts';

export interface FileHandlers {
  /** A file parsed and validated: replace the document. */
  readonly onOpened: (doc: PortDocument, fileName: string) => void;
  /** A file could not be read or is not a valid section: show the message, keep the current work. */
  readonly onRejected: (message: string, fileName: string) => void;
}

/** Largest file we read, bytes (the loader has its own limit on text too). */
const MAX_FILE_BYTES = 5 * 1024 * 1024;

async function openFile(file: File, handlers: FileHandlers): Promise<void> {
  if (file.size > MAX_FILE_BYTES) {
    handlers.onRejected(`"${file.name}" is ${(file.size / 1e6).toFixed(1)} MB; a section file is at most 5 MB.`, file.name);
    return;
  }
  let text: string;
  try {
    text = await file.text();
  } catch {
    handlers.onRejected(`"${file.name}" could not be read.`, file.name);
    return;
  }
  const notSection = notJsonText(text);
  if (notSection !== null) {
    handlers.onRejected(`"${file.name}" was not opened: ${notSection}`, file.name);
    return;
  }
  try {
    handlers.onOpened(loadDocument(text), file.name);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    handlers.onRejected(`"${file.name}" was not opened: ${message}`, file.name);
  }
}

/**
 * Why `text` cannot be a section file at all, in plain words, or null when it may be one (the loader then says
 * what is wrong inside). Bytes that are not text decode to U+FFFD; a NUL never appears in a text file.
 */
export function notJsonText(text: string): string | null {
  if (/[\u0000\uFFFD]/.test(text.slice(0, 4096))) {
    return 'it is not a text file (it looks like a picture, a PDF or another program\'s file); a section file is JSON text saved by Portwright.';
  }
  const first = text.trimStart().charAt(0);
  if (first !== '{') {
    return 'it is not a Portwright section file: a section file is JSON text that starts with "{".';
  }
  return null;
}

/** Ask for a file with the browser's picker. */
export function pickFile(input: HTMLInputElement, handlers: FileHandlers): void {
  input.onchange = () => {
    const file = input.files?.[0];
    input.value = '';
    if (file) void openFile(file, handlers);
  };
  input.click();
}

/** Offer the document as a download named after its title. */
export function downloadDocument(doc: PortDocument): string {
  const name = fileNameFor(doc.title);
  downloadText(name, saveDocument(doc));
  return name;
}

/** Offer `text` as a download named `name`. */
export function downloadText(name: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: 'application/json' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** A file name made from a title, e.g. "Street intake" -> "street-intake.portwright.json". */
export function fileNameFor(title: string): string {
  const stem = title.trim().toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '') || 'section';
  return `${stem}.portwright.json`;
}

/** Accept files dropped anywhere on the page. */
export function acceptDrops(target: HTMLElement, handlers: FileHandlers): void {
  target.addEventListener('dragover', (event) => {
    event.preventDefault();
    target.classList.add('dropping');
  });
  target.addEventListener('dragleave', () => target.classList.remove('dropping'));
  target.addEventListener('drop', (event) => {
    event.preventDefault();
    target.classList.remove('dropping');
    const file = event.dataTransfer?.files[0];
    if (file) void openFile(file, handlers);
  });
}
