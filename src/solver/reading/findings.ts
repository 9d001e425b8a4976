/** Findings: the reading boiled down to a ranked list of plain sentences, each with a place to look. */
import type { ReadingSettings } from './options.ts';
import type { Finding, FlowReading, WallDetachmentReading, WallReading } from './types.ts';
import { areaText, lengthText, opening, percentText, ratioText } from './wording.ts';

/** Slow zones smaller than this share of the port are not worth a line. */
const SLOW_SHARE_WORTH_TELLING = 0.01;

/**
 * Ranked findings, each told as a whole sentence (the same in the app, the command's text and its JSON). Scores
 * order the list and are a judgement, not physics: a likely detachment on a port wall first
 * (higher for a bigger pressure climb after the peak, measured in inlet dynamic heads and full at 4), then a large
 * slow share, the tightest station, over-wide stations and the fastest port wall. Walls past the valve and the valve
 * head itself are read but not told. `h` is the grid's cell size (document units), the smallest zoom radius given.
 */
export function findings(reading: Omit<FlowReading, 'findings'>, settings: ReadingSettings, h: number): Finding[] {
  // walls past the valve (deck, test bore) and round the valve head are read but not told: they are not port metal
  const portWalls = reading.walls.filter((w) => w.inPort);
  const out: Finding[] = [];
  for (const d of reading.detachments) {
    const wall = portWalls.find((w) => w.name === d.name);
    if (d.detachment && wall) out.push(detachmentFinding(d, wall, settings, h));
  }
  out.push(...tightestFinding(reading, settings, h), ...slowFinding(reading, settings, h), ...overWideFindings(reading, settings, h));
  const fastest = portWalls.reduce<WallReading | null>((best, w) => (best && best.peak.speedRatio >= w.peak.speedRatio ? best : w), null);
  if (fastest) {
    out.push({
      score: 0.2 + 0.05 * Math.min(2, fastest.peak.speedRatio),
      kind: 'peak',
      text: `Fastest wall flow on the ${fastest.name}: ${ratioText(fastest.peak.speedRatio)} times the mean inlet speed.`,
      x: fastest.peak.x,
      y: fastest.peak.y,
      radius: 6 * h,
    });
  }
  return out.sort((a, b) => b.score - a.score);
}

type PartReading = Omit<FlowReading, 'findings'>;

/** Plane: the narrowest section by its width; with a depth, the least area, with its width in the section beside it. */
function tightestFinding({ tightest, valvePhi, model }: PartReading, settings: ReadingSettings, h: number): Finding[] {
  if (!tightest) return [];
  const u = settings.units;
  const ahead = valvePhi !== null ? ' ahead of the valve' : '';
  const from = `${lengthText(tightest.distanceFromInlet, u)} from the manifold face.`;
  const text = model === 'plane'
    ? `Tightest section${ahead}: ${lengthText(tightest.width, u)} wide, ${from}`
    : `Least area${ahead}: ${areaText(tightest.area, u)} (${lengthText(tightest.width, u)} across the section), ${from}`;
  return [{
    score: 0.6,
    kind: 'tightest',
    text,
    x: 0.5 * (tightest.x1 + tightest.x2),
    y: 0.5 * (tightest.y1 + tightest.y2),
    radius: Math.max(0.75 * tightest.width, 4 * h),
  }];
}

function slowFinding({ slow, valvePhi }: PartReading, settings: ReadingSettings, h: number): Finding[] {
  if (!slow.largest || slow.portShare < SLOW_SHARE_WORTH_TELLING) return [];
  const part = valvePhi !== null ? 'the port ahead of the valve' : 'the section';
  return [{
    score: 0.5 + 0.4 * Math.min(1, 2 * slow.portShare),
    kind: 'slow',
    text: `${percentText(slow.portShare)} of ${part} moves below ${percentText(settings.slowFraction)} of its local mean speed.`,
    x: slow.largest.x,
    y: slow.largest.y,
    radius: Math.max(slow.largest.radius, 4 * h),
  }];
}

function overWideFindings(reading: PartReading, settings: ReadingSettings, h: number): Finding[] {
  const u = settings.units;
  return overWideRuns(reading).map((run) => ({
    score: 0.3 + Math.min(0.4, run.excess / run.envelope),
    kind: 'over-wide',
    text: `Over-wide: the section ${lengthText(reading.stations[run.index].distanceFromInlet, u)} from the manifold face is ` +
      `${lengthText(run.excess, u)} (${percentText(run.excess / run.envelope)}) wider than the sections either side.`,
    x: 0.5 * (run.x1 + run.x2),
    y: 0.5 * (run.y1 + run.y2),
    radius: Math.max(0.6 * run.width, 4 * h),
  }));
}

/**
 * The detachment told against the fall that causes it: the highest speed on the wall up to the detachment, and the
 * lowest after that until the flow is likely back on the wall (or the wall ends).
 */
function detachmentFinding(d: WallDetachmentReading, wall: WallReading, settings: ReadingSettings, h: number): Finding {
  const at = d.detachment!;
  const u = settings.units;
  const { samples } = wall;
  const count = samples.length / 4;
  const until = d.offWall.length > 0 ? d.offWall[0][1] : Infinity;
  let peak = -1;
  for (let q = 0; q < count && samples[4 * q + 2] <= at.s; q++) if (peak < 0 || samples[4 * q + 3] > samples[4 * peak + 3]) peak = q;
  peak = Math.max(peak, 0);
  let low = peak;
  for (let q = peak + 1; q < count && samples[4 * q + 2] <= until; q++) if (samples[4 * q + 3] < samples[4 * low + 3]) low = q;
  const top = samples[4 * peak + 3], bottom = samples[4 * low + 3];
  const past = Math.max(0, at.s - samples[4 * peak + 2]);
  const off = d.offWall.length > 0 ? d.offWall[0][1] - d.offWall[0][0] : 0;
  const stretch = off > 0 ? ` and likely stays off for ${lengthText(off, u)}` : '';
  // the pressure the layer had to climb, in inlet dynamic heads: (U_peak^2 - U_low^2) / U_inlet^2
  const climb = top * top - bottom * bottom;
  return {
    score: 0.7 + 0.3 * Math.min(1, climb / 4),
    kind: 'detachment',
    text: `${opening(d.name)}: flow likely leaves the wall ${lengthText(past, u)} past the speed peak${stretch}; ` +
      `speed ratio falls from ${ratioText(top)} to ${ratioText(bottom)}.`,
    x: at.x,
    y: at.y,
    radius: Math.max(4 * h, past, 0.5 * off),
  };
}

/** Over-wide stations grouped into runs of consecutive stations; each run is told once, at its widest excess. */
function overWideRuns(reading: PartReading): FlowReading['overWide'] {
  const runs: FlowReading['overWide'][number][] = [];
  let previous = -2;
  for (const s of reading.overWide) {
    const last = runs[runs.length - 1];
    if (last && s.index === previous + 1) {
      if (s.excess / s.envelope > last.excess / last.envelope) runs[runs.length - 1] = s;
    } else runs.push(s);
    previous = s.index;
  }
  return runs;
}
