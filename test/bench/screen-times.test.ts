/** The drag benchmark's reading of a browser trace, on a hand-made trace whose answers are known. */
import { describe, expect, it } from 'vitest';
import { presentedFrames, screenTimes, type TraceEvent } from '../../bench/screen-times.ts';

const cat = 'cc,benchmark,disabled-by-default-devtools.timeline.frame';
/** A frame: begins at b, commits at c, ends (presented or not) at e; µs. */
function frame(id: string, b: number, c: number, e: number, state = 'STATE_PRESENTED_ALL'): TraceEvent[] {
  return [
    { name: 'PipelineReporter', ph: 'b', ts: b, pid: 1, cat, id2: { local: id }, args: { frame_reporter: { state } } },
    { name: 'Commit', ph: 'b', ts: c, pid: 1, cat, id2: { local: id } },
    { name: 'Commit', ph: 'e', ts: c + 100, pid: 1, cat, id2: { local: id } },
    { name: 'PipelineReporter', ph: 'e', ts: e, pid: 1, cat, id2: { local: id } },
  ];
}
const mark = (ts: number, message: string): TraceEvent => ({ name: 'TimeStamp', ph: 'I', ts, cat: 'devtools.timeline', args: { data: { message } } });

describe('screen times from a trace', () => {
  it('keeps presented frames only, with their commit time, even when an id is used again', () => {
    const frames = presentedFrames([
      ...frame('0x1', 0, 5_000, 30_000),
      ...frame('0x1', 30_000, 40_000, 90_000, 'STATE_DROPPED'),
      ...frame('0x2', 50_000, 60_000, 120_000),
    ]);
    expect(frames).toEqual([{ commitUs: 5_000, presentedUs: 30_000 }, { commitUs: 60_000, presentedUs: 120_000 }]);
  });

  it('times a repaint to the first presented frame that committed after it, from the event\'s own time stamp', () => {
    const events = [
      // The movement happened at 10 ms and reached the page 2 ms later.
      mark(12_000, 'input 2'),
      ...frame('0x1', 11_000, 14_000, 40_000), // commits after the movement: the floor, 30 ms
      mark(25_000, 'repaint'),
      ...frame('0x2', 20_000, 24_000, 60_000, 'STATE_DROPPED'),
      ...frame('0x3', 26_000, 28_000, 75_000), // first presented commit after the repaint: 65 ms
    ];
    expect(screenTimes(events)).toEqual([{ firstFrameMs: 30, repaintMs: 15, onScreenMs: 65 }]);
  });

  it('counts movements handled as one from the first of them', () => {
    const events = [mark(10_000, 'input 0'), mark(12_000, 'input 0'), mark(20_000, 'repaint'), ...frame('0x1', 21_000, 22_000, 50_000)];
    expect(screenTimes(events)).toEqual([{ firstFrameMs: 40, repaintMs: 10, onScreenMs: 40 }]);
  });
});
