import { describe, expect, it } from 'vitest';
import {
  affineOf,
  fitBounds,
  panBy,
  screenToSection,
  sectionToScreen,
  visibleBounds,
  zoomAbout,
  type ViewState,
} from '../../src/view/view-transform.ts';

const view: ViewState = { centreX: 10, centreY: 5, scale: 4, width: 800, height: 600 };

function close(a: { x: number; y: number }, b: { x: number; y: number }): void {
  expect(a.x).toBeCloseTo(b.x, 9);
  expect(a.y).toBeCloseTo(b.y, 9);
}

describe('view transform', () => {
  it('puts the centre in the middle with section y up', () => {
    expect(sectionToScreen(view, 10, 5)).toEqual({ x: 400, y: 300 });
    expect(sectionToScreen(view, 11, 6)).toEqual({ x: 404, y: 296 });
  });

  it('maps screen to section and back', () => {
    const p = screenToSection(view, 123, 456);
    close(sectionToScreen(view, p.x, p.y), { x: 123, y: 456 });
  });

  it('gives the same mapping as scale and offsets', () => {
    const t = affineOf(view);
    const p = sectionToScreen(view, -3, 7.5);
    close({ x: t.offsetX + t.scale * -3, y: t.offsetY - t.scale * 7.5 }, p);
  });

  it('keeps the point under the cursor fixed while zooming', () => {
    const before = screenToSection(view, 650, 120);
    const zoomed = zoomAbout(view, 2.5, 650, 120);
    expect(zoomed.scale).toBe(10);
    close(screenToSection(zoomed, 650, 120), before);
  });

  it('pans the picture with the drag', () => {
    const moved = panBy(view, 40, -20);
    close(sectionToScreen(moved, 10, 5), { x: 440, y: 280 });
  });

  it('fits bounds inside the free area, centred in it', () => {
    const b = { minX: 0, minY: 0, maxX: 40, maxY: 40 };
    const insets = { left: 20, right: 120, top: 20, bottom: 60 };
    const fitted = fitBounds(view, b, insets);
    // free area 660 x 520 px: height limits, 13 px per unit.
    expect(fitted.scale).toBeCloseTo(13, 12);
    const lowLeft = sectionToScreen(fitted, 0, 0);
    const upRight = sectionToScreen(fitted, 40, 40);
    expect(upRight.y).toBeCloseTo(20, 9);
    expect(lowLeft.y).toBeCloseTo(540, 9);
    expect((lowLeft.x + upRight.x) / 2).toBeCloseTo(20 + 660 / 2, 9);
    const seen = visibleBounds(fitted);
    expect(seen.minX).toBeLessThan(0);
    expect(seen.maxY).toBeGreaterThan(40);
  });
});
