/**
 * When did a repaint reach the screen? Reads a Chromium trace (categories "benchmark", "cc", "devtools.timeline")
 * in which the page marked its moments with console.timeStamp: "input <ms>" when a pointer movement reached the
 * page, <ms> after the event's own time stamp, and "repaint" when the field was handed to WebGL. Each frame the browser shows leaves a
 * PipelineReporter span, from the start of the frame to its presentation, with a Commit step inside: a repaint is on
 * screen at the end of the first presented frame that committed after it.
 */

export interface TraceEvent {
  readonly name: string;
  readonly ph: string;
  readonly ts: number;
  readonly pid?: number;
  readonly cat?: string;
  readonly id2?: { readonly local?: string };
  readonly args?: { readonly data?: { readonly message?: string }; readonly frame_reporter?: { readonly state?: string } };
}

/** One drag step, ms from the pointer movement. */
export interface ScreenTimes {
  /** To the frame after the movement reaching the screen: what any change of the page would take (the floor). */
  readonly firstFrameMs: number;
  /** To the repaint handed to WebGL (page clock). */
  readonly repaintMs: number;
  /** To the frame carrying that repaint reaching the screen. */
  readonly onScreenMs: number;
}

interface PresentedFrame {
  readonly commitUs: number;
  readonly presentedUs: number;
}

/** Presented frames with their commit time, µs (trace clock). */
export function presentedFrames(events: readonly TraceEvent[]): PresentedFrame[] {
  const open = new Map<string, { state: string; commitUs: number | null }>();
  const frames: PresentedFrame[] = [];
  const steps = events
    .filter((e) => e.cat?.includes('benchmark') && e.id2?.local !== undefined && (e.ph === 'b' || e.ph === 'e'))
    // At one time stamp, ends before begins: a span that ends as the next begins must not swallow it.
    .sort((a, b) => a.ts - b.ts || Number(b.ph === 'e') - Number(a.ph === 'e'));
  for (const e of steps) {
    const key = `${e.pid} ${e.id2?.local}`;
    if (e.name === 'PipelineReporter' && e.ph === 'b') open.set(key, { state: e.args?.frame_reporter?.state ?? '', commitUs: null });
    else if (e.name === 'PipelineReporter') {
      const frame = open.get(key);
      open.delete(key);
      if (frame && frame.commitUs !== null && frame.state.startsWith('STATE_PRESENTED')) frames.push({ commitUs: frame.commitUs, presentedUs: e.ts });
    } else if (e.name === 'Commit' && e.ph === 'b') {
      const frame = open.get(key);
      if (frame) frame.commitUs = e.ts;
    }
  }
  return frames.sort((a, b) => a.commitUs - b.commitUs);
}

/** Each repaint with the pointer movement that led to it; movements in between (handled as one) count from the first. */
export function screenTimes(events: readonly TraceEvent[]): ScreenTimes[] {
  const frames = presentedFrames(events);
  const shownAfter = (us: number) => frames.find((f) => f.commitUs > us)?.presentedUs ?? null;
  const marks = events
    .filter((e) => e.name === 'TimeStamp' && e.args?.data?.message)
    .map((e) => {
      const [kind, lateMs] = e.args!.data!.message!.split(' ');
      // An input mark counts from the event's own time stamp, before it reached the page.
      return { kind, us: kind === 'input' ? e.ts - 1000 * Number(lateMs) : e.ts };
    })
    .sort((a, b) => a.us - b.us);
  const out: ScreenTimes[] = [];
  let inputUs: number | null = null;
  for (const m of marks) {
    if (m.kind === 'input' && inputUs === null) inputUs = m.us;
    else if (m.kind === 'repaint' && inputUs !== null) {
      const first = shownAfter(inputUs);
      const shown = shownAfter(m.us);
      if (first !== null && shown !== null) {
        out.push({ firstFrameMs: (first - inputUs) / 1000, repaintMs: (m.us - inputUs) / 1000, onScreenMs: (shown - inputUs) / 1000 });
      }
      inputUs = null;
    }
  }
  return out;
}
