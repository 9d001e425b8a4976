/** Which samples downstream of a detachment are likely to have the flow off the wall. */

/**
 * Marks offWall[i] = 1 from the detachment onwards until the edge speed first rises above its value at the
 * detachment point (by then the pressure rise that lifted the flow off has been undone, so it may reattach).
 * The first sample at or after detachment is always marked, so a detachment is never invisible.
 * @param sM arc length, m
 * @param speedMs edge speed, m/s
 * @param detachmentSM arc length of detachment, m
 * @param index first sample at or after detachmentSM
 * @param offWall output, one per sample (written in place and returned)
 */
export function offWallStretch(
  sM: Float64Array,
  speedMs: Float64Array,
  detachmentSM: number,
  index: number,
  offWall: Uint8Array,
): Uint8Array {
  const speedAtDetachment = speedAtArc(sM, speedMs, detachmentSM, index);
  offWall[index] = 1;
  for (let i = index + 1; i < sM.length && speedMs[i] <= speedAtDetachment; i++) offWall[i] = 1;
  return offWall;
}

/** Edge speed at arc length s, linear in the segment ending at sample `index` (the first at or after s). */
export function speedAtArc(sM: Float64Array, speedMs: Float64Array, s: number, index: number): number {
  if (index === 0 || sM[index] <= s) return speedMs[index];
  const t = (s - sM[index - 1]) / (sM[index] - sM[index - 1]);
  return speedMs[index - 1] + t * (speedMs[index] - speedMs[index - 1]);
}
