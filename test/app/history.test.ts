/** The undo history as pure data: record, undo, redo, the cap, and random sequences that undo back to the start. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { emptyHistory, recordStep, redoLabels, redoStep, undoLabels, undoStep, type History } from '../../src/app/history.ts';

type Doc = { readonly n: number };
const doc = (n: number): Doc => ({ n });

describe('undo history', () => {
  it('undoes to the document before a step and redoes to the one after', () => {
    const a = doc(1), b = doc(2), c = doc(3);
    let h: History<Doc> = emptyHistory();
    h = recordStep(h, { before: a, after: b, label: 'Move point' });
    h = recordStep(h, { before: b, after: c, label: 'Set fillet radius' });
    expect(undoLabels(h, 5)).toEqual(['Set fillet radius', 'Move point']);
    const u1 = undoStep(h)!;
    expect(u1.step.before).toBe(b);
    const u2 = undoStep(u1.history)!;
    expect(u2.step.before).toBe(a);
    expect(undoStep(u2.history)).toBeNull();
    expect(redoLabels(u2.history, 5)).toEqual(['Move point', 'Set fillet radius']);
    const r1 = redoStep(u2.history)!;
    expect(r1.step.after).toBe(b);
    expect(redoStep(r1.history)!.step.after).toBe(c);
  });

  it('does not record a step that changes nothing', () => {
    const a = doc(1);
    expect(recordStep(emptyHistory<Doc>(), { before: a, after: a, label: 'Move point' }).undo).toHaveLength(0);
  });

  it('a new step clears what could be redone', () => {
    let h = recordStep(emptyHistory<Doc>(), { before: doc(1), after: doc(2), label: 'one' });
    h = undoStep(h)!.history;
    expect(h.redo).toHaveLength(1);
    h = recordStep(h, { before: doc(1), after: doc(3), label: 'two' });
    expect(h.redo).toHaveLength(0);
    expect(redoStep(h)).toBeNull();
  });

  it('keeps at most the cap, forgetting the oldest steps', () => {
    let h = emptyHistory<Doc>();
    for (let k = 0; k < 7; k++) h = recordStep(h, { before: doc(k), after: doc(k + 1), label: `step ${k}` }, 3);
    expect(h.undo.map((s) => s.label)).toEqual(['step 4', 'step 5', 'step 6']);
    expect(() => recordStep(h, { before: doc(0), after: doc(1), label: 'x' }, 0)).toThrow(/at least one step/);
  });

  it('any sequence of steps, undone completely, gives back the very first document; redone, the last', () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: 1, max: 9 }), { minLength: 1, maxLength: 40 }), (moves) => {
      const start = doc(0);
      let current = start;
      let h = emptyHistory<Doc>();
      for (const m of moves) {
        const next = doc(current.n + m);
        h = recordStep(h, { before: current, after: next, label: `+${m}` });
        current = next;
      }
      const last = current;
      for (let u = undoStep(h); u !== null; u = undoStep(h)) {
        h = u.history;
        current = u.step.before;
      }
      expect(current).toBe(start);
      for (let r = redoStep(h); r !== null; r = redoStep(h)) {
        h = r.history;
        current = r.step.after;
      }
      expect(current).toBe(last);
    }), { seed: 11, numRuns: 200 });
  });
});
