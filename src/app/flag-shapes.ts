/** Turns a flow reading into the view's flag overlays: slow cells hatched, the tightest station, over-wide stations, detachment. */
import { areaLabel, lengthLabel } from '../breathing/units.ts';
import type { Units } from '../document/types.ts';
import type { FieldReply } from '../workers/protocol.ts';
import type { FlagLine, FlagMarker, FlagShapes } from '../view/types.ts';

export function flagShapes(reply: FieldReply, units: Units): FlagShapes {
  const reading = reply.reading;
  if (!reading) return { hatched: [], lines: [], markers: [] };
  const digits = units === 'mm' ? 1 : 3;
  const label = lengthLabel(units);
  const lines: FlagLine[] = [];
  const markers: FlagMarker[] = [];
  const t = reading.tightest;
  // With a width profile or round model the tightest station is the one of least area, so its area is the label.
  const tightestText = (area: number, width: number) =>
    reading.model === 'plane' ? `tightest ${width.toFixed(digits)} ${label}` : `least area ${area.toFixed(units === 'mm' ? 0 : 3)} ${areaLabel(units)}`;
  if (t) lines.push({ xy: new Float64Array([t.x1, t.y1, t.x2, t.y2]), label: tightestText(t.area, t.width) });
  for (const w of reading.overWide) {
    lines.push({ xy: new Float64Array([w.x1, w.y1, w.x2, w.y2]), label: `over-wide +${w.excess.toFixed(digits)} ${label}` });
  }
  // Only the port's walls get detachment flags: the bore below the valve is the bench's, not the porter's.
  for (const d of reading.detachments) {
    const wall = reading.walls.find((w) => w.name === d.name);
    if (!wall?.inPort || !d.detachment) continue;
    markers.push({ x: d.detachment.x, y: d.detachment.y, label: `${d.name}: flow leaves the wall` });
    for (const [s0, s1] of d.offWall) lines.push({ xy: wallStretch(wall.samples, s0, s1), label: '' });
  }
  const hatchedCells = { nx: reply.nx, ny: reply.ny, x0: reply.x0, y0: reply.y0, h: reply.h, mask: reading.slow.mask };
  return { hatched: [], hatchedCells, lines, markers };
}

/** The wall samples (x, y, s, ratio per sample) between arc lengths s0 and s1, as a polyline. */
function wallStretch(samples: Float64Array, s0: number, s1: number): Float64Array {
  const xy: number[] = [];
  for (let k = 0; k + 3 < samples.length; k += 4) {
    if (samples[k + 2] >= s0 && samples[k + 2] <= s1) xy.push(samples[k], samples[k + 1]);
  }
  return new Float64Array(xy);
}
