/** Dev-only page for the view's browser check: the exact concentric-bend field with contours, walls, a streamline and flags. */

import { FlowView } from '../../../src/view/flow-view.ts';
import type { FlagShapes, Polyline } from '../../../src/view/types.ts';
import { arcXY, bendClip, bendField, bendWalls, type Bend } from '../../view/bend-field.ts';

const bend: Bend = { r1: 20, r2: 40 };
/** Cell size, mm: 160 x 160 cells over the bend. */
const H = 0.25;

/** Free vortex: stream function ~ ln r, so the streamline splitting the flux in half is r = sqrt(r1 r2). [derived] */
const midStreamline: Polyline = {
  xy: Float64Array.from(arcXY(Math.sqrt(bend.r1 * bend.r2), 0, Math.PI / 2, 90)),
  closed: false,
};

/** Flags placed by hand to exercise every kind of overlay; they are not a flow reading. */
function demoFlags(): FlagShapes {
  const deg = Math.PI / 180;
  const band = [...arcXY(bend.r2 - 3, 50 * deg, 75 * deg, 20), ...arcXY(bend.r2 - 0.01, 75 * deg, 50 * deg, 20)];
  const cells = bendField(bend, 1);
  const mask = new Uint8Array(cells.nx * cells.ny);
  for (let j = 0; j < cells.ny; j++) {
    for (let i = 0; i < cells.nx; i++) {
      const x = cells.x0 + (i + 0.5) * cells.h;
      const y = cells.y0 + (j + 0.5) * cells.h;
      const a = Math.atan2(y, x) / deg;
      mask[i + j * cells.nx] = Math.hypot(x, y) > bend.r2 - 4 && Math.hypot(x, y) < bend.r2 && a > 8 && a < 22 ? 1 : 0;
    }
  }
  return {
    hatched: [{ xy: Float64Array.from(band), closed: true }],
    hatchedCells: { nx: cells.nx, ny: cells.ny, x0: cells.x0, y0: cells.y0, h: cells.h, mask },
    lines: [{ xy: Float64Array.from([bend.r1 * Math.cos(35 * deg), bend.r1 * Math.sin(35 * deg), bend.r2 * Math.cos(35 * deg), bend.r2 * Math.sin(35 * deg)]), label: 'tightest station' }],
    markers: [{ x: bend.r1 * Math.cos(62 * deg), y: bend.r1 * Math.sin(62 * deg), label: 'detachment' }],
  };
}

const container = document.getElementById('view')!;
/** What the app clears on every drag step and sets again after a full solve. */
const overlays = {
  field: bendField(bend, H),
  levels: [0.8, 0.9, 1.0, 1.1, 1.2, 1.3, 1.4],
  clip: bendClip(bend),
  streamlines: [midStreamline],
  flags: demoFlags(),
};
const view = new FlowView(container, { units: 'mm', contourLevels: overlays.levels });
view.setField(overlays.field);
view.setClip(overlays.clip);
view.setWalls(bendWalls(bend));
view.setStreamlines(overlays.streamlines);
view.setFlags(overlays.flags);
view.renderNow();

/** Every pixel of the composed picture (device px), RGBA bytes row by row from the top. */
function pixels(): { width: number; height: number; data: number[] } {
  const snap = view.snapshot();
  const img = snap.getContext('2d')!.getImageData(0, 0, snap.width, snap.height);
  return { width: img.width, height: img.height, data: Array.from(img.data) };
}

/** RGBA bytes of the composed picture at section points. One readback for all points. */
function sample(points: readonly { x: number; y: number }[]): number[][] {
  const snap = view.snapshot();
  const img = snap.getContext('2d')!.getImageData(0, 0, snap.width, snap.height);
  const ratio = snap.width / container.clientWidth;
  return points.map((p) => {
    const s = view.sectionToScreen(p.x, p.y);
    const k = 4 * (Math.floor(s.x * ratio) + Math.floor(s.y * ratio) * img.width);
    return [img.data[k], img.data[k + 1], img.data[k + 2], img.data[k + 3]];
  });
}

/** WebGL error state of the view's canvas (0 = none). */
function glError(): number {
  const canvas = container.querySelector('canvas')!;
  const gl = canvas.getContext('webgl2')!;
  return gl.getError();
}

/** Resolves after the next animation frame has rendered. */
function nextFrame(): Promise<void> {
  return new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve())));
}

Object.assign(window, { harness: { view, bend, overlays, container, sample, pixels, glError, nextFrame, ready: true } });
