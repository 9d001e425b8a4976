/**
 * Undo history of the document: pure data in, data out. A step keeps the whole document before and after
 * (documents are immutable and share untouched parts, so a snapshot costs only what the step changed).
 */

/** One undoable change: the document before and after it, and what to call it in the history list. */
export interface HistoryStep<D> {
  readonly before: D;
  readonly after: D;
  /** Plain words, e.g. "Set fillet radius", "Open \"tight.json\"". */
  readonly label: string;
  /** The step brought in a whole other document (a file, other units): undone or redone, it is shown afresh. */
  readonly wholeDocument?: boolean;
}

/** Steps that can be undone (oldest first, the last is undone next) and redone (the last is redone next). */
export interface History<D> {
  readonly undo: readonly HistoryStep<D>[];
  readonly redo: readonly HistoryStep<D>[];
}

/** Steps kept by default: older ones are forgotten first. */
export const HISTORY_CAP = 200;

export function emptyHistory<D>(): History<D> {
  return { undo: [], redo: [] };
}

/**
 * Records a committed change. A step that changes nothing (before === after) is not recorded. A new step clears
 * what could be redone (the redone future no longer follows from here); beyond `cap` steps the oldest is dropped.
 */
export function recordStep<D>(history: History<D>, step: HistoryStep<D>, cap = HISTORY_CAP): History<D> {
  if (step.before === step.after) return history;
  if (!(cap >= 1)) throw new RangeError(`A history must keep at least one step; got a cap of ${cap}.`);
  const undo = [...history.undo, step];
  return { undo: undo.length > cap ? undo.slice(undo.length - cap) : undo, redo: [] };
}

/** The step to undo and the history after undoing it, or null when there is nothing to undo. */
export function undoStep<D>(history: History<D>): { readonly step: HistoryStep<D>; readonly history: History<D> } | null {
  const step = history.undo.at(-1);
  if (step === undefined) return null;
  return { step, history: { undo: history.undo.slice(0, -1), redo: [...history.redo, step] } };
}

/** The step to redo and the history after redoing it, or null when there is nothing to redo. */
export function redoStep<D>(history: History<D>): { readonly step: HistoryStep<D>; readonly history: History<D> } | null {
  const step = history.redo.at(-1);
  if (step === undefined) return null;
  return { step, history: { undo: [...history.undo, step], redo: history.redo.slice(0, -1) } };
}

/** Labels of the steps that can be undone, newest first, at most `count`. */
export function undoLabels<D>(history: History<D>, count: number): string[] {
  return history.undo.slice(-count).map((s) => s.label).reverse();
}

/** Labels of the steps that can be redone, next first, at most `count`. */
export function redoLabels<D>(history: History<D>, count: number): string[] {
  return history.redo.slice(-count).map((s) => s.label).reverse();
}
