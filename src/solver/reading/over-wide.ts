/** Over-wide stations: cross-sections wider than the smooth run of stations around them. */
import type { OverWideStation, Station } from './types.ts';

/**
 * Flags stations (of the judged ones with potential above `valvePhi`: the port, upstream of the valve; all judged
 * ones when null) whose
 * width exceeds their envelope by more than `threshold` (a share, e.g. 0.1).
 * The envelope is a morphological opening of the width sequence over `window` stations: a running minimum, then a
 * running maximum of that. It follows straight tapers and narrow throats exactly and cuts off any bulge spanning
 * fewer stations than the window, so a local widening is measured against the stations on either side of it rather
 * than against itself (a running median would follow a bulge three stations long). Bulges as long as the window
 * or longer count as a change of port size, not a bulge.
 */
export function overWideStations(stations: readonly Station[], valvePhi: number | null, threshold: number, window: number): OverWideStation[] {
  const picked = stations.map((s, index) => ({ s, index })).filter(({ s }) => s.judged && (valvePhi === null || s.phi > valvePhi));
  const envelope = opening(picked.map(({ s }) => s.width), (window - 1) / 2);
  const out: OverWideStation[] = [];
  picked.forEach(({ s, index }, k) => {
    if (!(s.width > envelope[k] * (1 + threshold))) return;
    out.push({ index, width: s.width, envelope: envelope[k], excess: s.width - envelope[k], x1: s.x1, y1: s.y1, x2: s.x2, y2: s.y2 });
  });
  return out;
}

/**
 * Running maximum of the running minimum over k - half .. k + half. The sequence is first extended at each end by
 * its point reflection (w[-m] = 2 w[0] - w[m]), so a straight taper runs on past the ends and is kept exactly;
 * without that the shortened end windows would pull the envelope down at the first and last stations. A bulge at the
 * very end looks the same as a trend there and is not flagged.
 */
export function opening(values: readonly number[], half: number): number[] {
  const n = values.length;
  if (n === 0) return [];
  const padded = Array.from({ length: n + 2 * half }, (_, p) => {
    const k = p - half;
    if (k < 0) return 2 * values[0] - values[Math.min(n - 1, -k)];
    if (k >= n) return 2 * values[n - 1] - values[Math.max(0, 2 * (n - 1) - k)];
    return values[k];
  });
  const slide = (input: readonly number[], pick: (a: number, b: number) => number): number[] =>
    input.map((_, k) => {
      let v = input[k];
      for (let m = Math.max(0, k - half); m <= Math.min(input.length - 1, k + half); m++) v = pick(v, input[m]);
      return v;
    });
  return slide(slide(padded, Math.min), Math.max).slice(half, half + n);
}
