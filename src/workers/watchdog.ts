/** Tells a worker that has stopped answering from one that is only slow: a silence limit scaled to the grid. */

/** Shortest silence taken for a hang, ms: a fresh worker loading its code, or a grid being set up, says nothing. */
export const MIN_SILENCE_MS = 6_000;

/**
 * Silence allowed per grid cell, ms: 20 s per million cells, about 30 times a whole solve and reading there on the
 * build machine (README, Speed), so a slow or busy machine is not mistaken for a hang.
 */
export const SILENCE_MS_PER_CELL = 0.02;

/** How long a worker solving `cells` cells may say nothing before it is taken for hung, ms. */
export function silenceLimitMs(cells: number, minMs = MIN_SILENCE_MS): number {
  return Math.max(minMs, cells * SILENCE_MS_PER_CELL);
}

/**
 * Counts the time a question goes unanswered. Any change of `heartbeat` (the solver's iteration count, shared with
 * the worker) starts the count again, so a long solve that keeps iterating is never taken for a hang. Only time
 * the page was listening counts: a tick that comes late (the page was busy, or its tab hidden) adds at most two
 * ticks, so the page's own stalls are never blamed on the worker.
 */
export class Watchdog {
  private limitMs = 0;
  private silentMs = 0;
  private lastBeat = 0;
  private lastTick = 0;
  private timer: ReturnType<typeof setInterval> | undefined;

  constructor(
    private readonly heartbeat: () => number,
    private readonly onSilent: () => void,
    private readonly tickMs = 250,
  ) {}

  /** Start (or start again) waiting for an answer: a silence longer than `limitMs` calls onSilent, once. */
  expect(limitMs: number): void {
    this.limitMs = limitMs;
    this.silentMs = 0;
    this.lastBeat = this.heartbeat();
    this.lastTick = performance.now();
    this.timer ??= setInterval(() => this.tick(), this.tickMs);
  }

  /** The answer came (or nothing is awaited any more). */
  answered(): void {
    clearInterval(this.timer);
    this.timer = undefined;
  }

  private tick(): void {
    const now = performance.now();
    const gap = now - this.lastTick;
    this.lastTick = now;
    const beat = this.heartbeat();
    if (beat !== this.lastBeat) {
      this.lastBeat = beat;
      this.silentMs = 0;
      return;
    }
    this.silentMs += Math.min(gap, 2 * this.tickMs);
    if (this.silentMs < this.limitMs) return;
    this.answered();
    this.onSilent();
  }
}
