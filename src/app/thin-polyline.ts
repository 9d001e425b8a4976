/** Drops polyline points closer than a spacing to the last kept one: the trace's fine steps cost the GPU, not the eye. */

/** `xy`: x0, y0, x1, y1, ...; keeps the first and last point. */
export function thinPolyline(xy: Float64Array, spacing: number): Float64Array {
  const n = xy.length / 2;
  if (n <= 2) return xy;
  const kept: number[] = [xy[0], xy[1]];
  const s2 = spacing * spacing;
  for (let k = 1; k < n - 1; k++) {
    const dx = xy[2 * k] - kept[kept.length - 2];
    const dy = xy[2 * k + 1] - kept[kept.length - 1];
    if (dx * dx + dy * dy >= s2) kept.push(xy[2 * k], xy[2 * k + 1]);
  }
  kept.push(xy[2 * n - 2], xy[2 * n - 1]);
  return new Float64Array(kept);
}
