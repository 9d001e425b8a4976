/** Wall reading: the speed peak on each wall and how far the speed falls after it (the pressure the flow must climb). */
import type { WallPath } from './wall-paths.ts';
import type { WallReading } from './types.ts';

/**
 * Peak speed ratio on a wall (samples in downstream order, see WallPath) and the lowest ratio downstream of it.
 * fall = low / peak; pressure recovered Cp = 1 - (low / peak)^2, the rise in static pressure after the peak over
 * the peak's dynamic pressure (Bernoulli along the wall). Samples whose ratio is NaN are passed over.
 * The wall is in the port when it is not the valve head and its upstream end lies ahead of the valve: a potential
 * above `valve.phi` (every wall is, when there is no valve). Returns null for a wall with no usable sample.
 */
export function readWall(path: WallPath, valve: { readonly phi: number; readonly name: string } | null = null): WallReading | null {
  const { samples } = path;
  const count = samples.length / 4;
  let peak = -1;
  for (let q = 0; q < count; q++) {
    const u = samples[4 * q + 3];
    if (Number.isFinite(u) && (peak < 0 || u > samples[4 * peak + 3])) peak = q;
  }
  if (peak < 0) return null;
  let low = peak;
  for (let q = peak + 1; q < count; q++) {
    const u = samples[4 * q + 3];
    if (Number.isFinite(u) && u < samples[4 * low + 3]) low = q;
  }
  const at = (q: number) => ({ x: samples[4 * q], y: samples[4 * q + 1], s: samples[4 * q + 2], speedRatio: samples[4 * q + 3] });
  const top = at(peak);
  const bottom = at(low);
  const fall = top.speedRatio > 0 ? bottom.speedRatio / top.speedRatio : 1;
  const onValve = valve !== null && (path.wall === valve.name || path.wall.startsWith(`${valve.name} (`));
  const inPort = valve === null || (!onValve && path.upstreamPhi > valve.phi);
  return { name: path.name, samples, inPort, peak: top, low: bottom, fall, pressureRecovered: 1 - fall * fall };
}
