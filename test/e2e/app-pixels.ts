/** Reads the app's drawn field back from the page and sorts its pixels by where they sit on the colour map. */

import type { Page } from 'playwright-core';
import { viridis } from '../../src/view/colour-map.ts';

/** Steps of the colour map the pixels are matched against (finer than the bins, so in-between colours match too). */
const MAP_STEPS = 128;

export interface FieldPixels {
  /** Pixels looked at: the whole view except the colour bar panel. */
  readonly total: number;
  /** Distinct RGB colours among them. */
  readonly distinct: number;
  /** Pixels within the tolerance of some colour-map colour, counted per equal bin of the map position 0..1. */
  readonly bins: number[];
}

/**
 * The view's picture (WebGL field, lines and labels, via view.snapshot()) with the colour bar panel left out, so
 * map colours can only come from the field itself. `tolerance` is a Euclidean RGB distance (0..255 per channel).
 */
export function fieldPixels(page: Page, binCount: number, tolerance: number): Promise<FieldPixels> {
  const map = Array.from({ length: MAP_STEPS + 1 }, (_, k) => viridis(k / MAP_STEPS).map((c) => c * 255));
  return page.evaluate(({ map, binCount, tolerance }) => {
    type View = { snapshot(): HTMLCanvasElement };
    const view = (window as unknown as { portwright: { view: View } }).portwright.view;
    const host = document.getElementById('view-host')!;
    const picture = view.snapshot();
    const ctx = picture.getContext('2d')!;
    const ratio = picture.width / host.clientWidth;
    // Any canvas smaller than the view is a panel drawn over it (the colour bar): leave its area out.
    const hostRect = host.getBoundingClientRect();
    const panels = [...host.querySelectorAll('canvas')]
      .map((c) => c.getBoundingClientRect())
      .filter((r) => r.width < hostRect.width / 2)
      .map((r) => ({ x0: (r.left - hostRect.left) * ratio, y0: (r.top - hostRect.top) * ratio, x1: (r.right - hostRect.left) * ratio, y1: (r.bottom - hostRect.top) * ratio }));
    const { data, width, height } = ctx.getImageData(0, 0, picture.width, picture.height);
    const bins = new Array<number>(binCount).fill(0);
    // Colour -> bin (-1: not a map colour); a picture repeats colours a lot.
    const binOf = new Map<number, number>();
    const tol2 = tolerance * tolerance;
    let total = 0;
    for (let y = 0; y < height; y++) {
      for (let x = 0; x < width; x++) {
        if (panels.some((p) => x >= p.x0 && x < p.x1 && y >= p.y0 && y < p.y1)) continue;
        const k = 4 * (x + y * width);
        const [r, g, b] = [data[k], data[k + 1], data[k + 2]];
        total++;
        const rgb = (r << 16) | (g << 8) | b;
        let bin = binOf.get(rgb);
        if (bin === undefined) {
          let best = Infinity;
          let at = 0;
          for (let m = 0; m < map.length; m++) {
            const d = (r - map[m][0]) ** 2 + (g - map[m][1]) ** 2 + (b - map[m][2]) ** 2;
            if (d < best) [best, at] = [d, m];
          }
          bin = best <= tol2 ? Math.min(binCount - 1, Math.floor((at / (map.length - 1)) * binCount)) : -1;
          binOf.set(rgb, bin);
        }
        if (bin >= 0) bins[bin]++;
      }
    }
    return { total, distinct: binOf.size, bins };
  }, { map, binCount, tolerance });
}
