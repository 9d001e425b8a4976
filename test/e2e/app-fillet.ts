/** Finds the short-side fillet handle of the running app on screen and drags it with the real mouse. */

import type { Page } from 'playwright-core';
import type { PortDocument, Point, Section } from '../../src/document/types.ts';
import { activeSection, cornerShape, filletHandlePosition, handleDistance } from '../../src/editor/index.ts';

/** The wall name the sample and the readings panel use for the short side. */
export const SHORT_SIDE = 'short side';

/** The document the app holds now (plain JSON, so it crosses into Node unchanged). */
export function appDocument(page: Page): Promise<PortDocument> {
  return page.evaluate(() => (window as unknown as { portwright: { store: { doc: PortDocument } } }).portwright.store.doc);
}

/** The outline corner where the two short-side edges meet and that carries a fillet: the short-side radius. */
export function shortSideCorner(section: Section): number {
  const { vertices, edges } = section.outline;
  const n = vertices.length;
  for (let k = 0; k < n; k++) {
    const before = edges[(k - 1 + n) % n];
    const after = edges[k];
    const named = (e: typeof after) => e.role === 'wall' && e.wallName === SHORT_SIDE;
    if (named(before) && named(after) && (vertices[k].filletRadius ?? 0) > 0) return k;
  }
  throw new Error(`No filleted corner between two "${SHORT_SIDE}" edges in the active section`);
}

/** Page CSS px (what page.mouse takes) of section points, through the view's own transform. */
export function toPage(page: Page, points: readonly Point[]): Promise<Point[]> {
  return page.evaluate((pts) => {
    type View = { sectionToScreen(x: number, y: number): { x: number; y: number } };
    const view = (window as unknown as { portwright: { view: View } }).portwright.view;
    const rect = document.getElementById('view-host')!.getBoundingClientRect();
    return pts.map(([x, y]) => {
      const s = view.sectionToScreen(x, y);
      return [rect.left + s.x, rect.top + s.y] as Point;
    });
  }, points as Point[]);
}

/** Centres of the editor overlay's round handles (fillet handles and points), page CSS px. */
export function overlayCircles(page: Page): Promise<Point[]> {
  return page.$$eval('#view-host svg.editor-overlay circle', (circles) => {
    const rect = document.getElementById('view-host')!.getBoundingClientRect();
    return circles.map((c) => [rect.left + Number(c.getAttribute('cx')), rect.top + Number(c.getAttribute('cy'))] as Point);
  });
}

export interface FilletGrip {
  /** Outline vertex index of the corner. */
  readonly vertex: number;
  /** Fillet radius now, document units. */
  readonly radius: number;
  /** Where the handle is drawn, page CSS px. */
  readonly handle: Point;
  /** Page CSS px of the handle for a given radius (document units): along the corner's bisector. */
  readonly handleFor: (radius: number) => Promise<Point>;
}

/** The short-side fillet handle of the active section, as the editor places it (src/editor fillet-handle). */
export async function shortSideGrip(page: Page): Promise<FilletGrip> {
  const section = activeSection(await appDocument(page));
  const vertex = shortSideCorner(section);
  const corner = cornerShape(section, vertex);
  const at = filletHandlePosition(section, vertex);
  if (!corner || !at) throw new Error(`Short-side corner ${vertex} has no fillet handle`);
  const handleFor = async (radius: number): Promise<Point> => {
    const d = handleDistance(corner.angle, radius);
    const [p] = await toPage(page, [[corner.at[0] + d * corner.bisector[0], corner.at[1] + d * corner.bisector[1]]]);
    return p;
  };
  const [handle] = await toPage(page, [at]);
  return { vertex, radius: section.outline.vertices[vertex].filletRadius ?? 0, handle, handleFor };
}

/** The point a fraction `t` of the way from `a` to `b`. */
export function between(a: Point, b: Point, t: number): Point {
  return [a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])];
}

/** Presses the mouse at `from` and moves it in `steps` equal steps to `to`; the button stays down. */
export async function pressAndMove(page: Page, from: Point, to: Point, steps: number): Promise<void> {
  await page.mouse.move(...from);
  await page.mouse.down();
  for (let k = 1; k <= steps; k++) await page.mouse.move(...between(from, to, k / steps));
}

/** Drags the handle in `steps` equal screen steps to the handle position of `radius` and lets go. */
export async function dragFillet(page: Page, grip: FilletGrip, radius: number, steps: number): Promise<Point> {
  const to = await grip.handleFor(radius);
  await pressAndMove(page, grip.handle, to, steps);
  await page.mouse.up();
  return to;
}

/** Zooms on the short-side corner as a porter would (at the fitted scale a few mm of radius are a few pixels) and
 * finds its handle again there. */
export async function zoomedShortSideGrip(page: Page, factor: number): Promise<FilletGrip> {
  await zoomAbout(page, (await shortSideGrip(page)).handle, factor);
  return shortSideGrip(page);
}

/** Zooms the view by `factor` about a page point (as the wheel would), so a drag of a few mm spans many pixels. */
export async function zoomAbout(page: Page, at: Point, factor: number): Promise<void> {
  await page.evaluate(({ at, factor }) => {
    type View = { zoomBy(factor: number, px: number, py: number): void };
    const view = (window as unknown as { portwright: { view: View } }).portwright.view;
    const rect = document.getElementById('view-host')!.getBoundingClientRect();
    view.zoomBy(factor, at[0] - rect.left, at[1] - rect.top);
  }, { at, factor });
}
