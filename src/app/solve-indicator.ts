/** The text at the top right that says whether a solve is in flight, and what the last one was. */
import type { SolveKind } from './live-solve.ts';

export type IndicatorState = 'busy' | 'idle' | 'error';

export class SolveIndicator {
  constructor(private readonly element: HTMLElement) {}

  /** Touches the page only when something changes: each drag step comes here twice. */
  show(state: IndicatorState, text: string): void {
    if (this.element.dataset.state !== state) this.element.dataset.state = state;
    if (this.element.textContent !== text) this.element.textContent = text;
  }

  started(kind: SolveKind, cells: number): void {
    this.show('busy', kind === 'drag' ? 'live preview…' : `solving ${cellsText(cells)}…`);
  }

  /** Mid-drag the text holds still (a time changing on every step would only flicker). */
  solved(kind: SolveKind, cells: number, ms: number, stillBusy: boolean): void {
    this.show(stillBusy ? 'busy' : 'idle', kind === 'drag' ? `live preview, ${cellsText(cells)}` : `${cellsText(cells)}, ${ms.toFixed(0)} ms`);
  }
}

/** "31k cells", "1.0M cells" (a million and more in millions). */
export function cellsText(cells: number): string {
  return `${cells >= 1e6 ? (cells / 1e6).toFixed(1) + 'M' : Math.round(cells / 1000) + 'k'} cells`;
}
