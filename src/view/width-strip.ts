/**
 * The plan-view strip under the section: the port unrolled along the flow, its width profile drawn as ±width/2 with
 * the stations as handles and obstructions as notches. It draws and reports handle drags; the app turns them into edits.
 */
import { STATION_RADIUS_PX, stripMarkup, stripScale, type StripPicture, type StripScale } from './width-strip-draw.ts';

export type { StripPicture } from './width-strip-draw.ts';

export interface StripDragHandlers {
  /** Station `index` dragged to (`along`, `width`), document units (width is twice the distance from the centre line). */
  readonly onDrag: (index: number, along: number, width: number) => void;
  /** The drag was let go. */
  readonly onRelease: () => void;
  /** The drag was called off (Escape, or the browser took the pointer). */
  readonly onCancel: () => void;
}

const SVG_NS = 'http://www.w3.org/2000/svg';

export class WidthStrip {
  private readonly svg: SVGSVGElement;
  private picture: StripPicture | null = null;
  private scale: StripScale | null = null;
  /** The station being dragged and its pointer, or null. */
  private drag: { readonly index: number; readonly pointer: number } | null = null;
  private readonly resizeObserver: ResizeObserver;

  constructor(private readonly host: HTMLElement, private readonly handlers: StripDragHandlers) {
    this.svg = document.createElementNS(SVG_NS, 'svg');
    this.svg.setAttribute('class', 'width-strip');
    this.svg.setAttribute('role', 'img');
    host.appendChild(this.svg);
    this.svg.addEventListener('pointerdown', this.onDown);
    this.svg.addEventListener('pointermove', this.onMove);
    this.svg.addEventListener('pointerup', this.onUp);
    this.svg.addEventListener('pointercancel', this.onCancelled);
    this.resizeObserver = new ResizeObserver(() => this.draw(true));
    this.resizeObserver.observe(host);
  }

  /** Show a picture, or hide the strip (null: no width profile). Mid-drag the scale holds, so the handle stays under the pointer. */
  show(picture: StripPicture | null): void {
    this.picture = picture;
    this.host.hidden = picture === null;
    this.svg.setAttribute('aria-label', picture?.title ?? '');
    this.draw(this.drag === null);
  }

  get dragging(): boolean {
    return this.drag !== null;
  }

  private draw(rescale: boolean): void {
    const p = this.picture;
    if (!p) return this.svg.replaceChildren();
    const { width, height } = this.host.getBoundingClientRect();
    if (width === 0 || height === 0) return;
    if (rescale || !this.scale) {
      const widest = Math.max(...p.stations.map((s) => s.width), ...Array.from({ length: p.outline.length / 2 }, (_, k) => p.outline[2 * k + 1]));
      this.scale = stripScale(width, height, p.alongMax, widest > 0 ? widest : 1);
    }
    this.svg.setAttribute('viewBox', `0 0 ${width} ${height}`);
    this.svg.innerHTML = stripMarkup(p, this.scale, height, this.drag?.index ?? -1);
  }

  /** A station's place on the page, CSS px from the strip's top left (for checks and scripts), or null. */
  handleAt(index: number): { x: number; y: number } | null {
    const circle = this.svg.querySelector<SVGCircleElement>(`[data-station="${index}"]`);
    if (!circle) return null;
    return { x: Number(circle.getAttribute('cx')), y: Number(circle.getAttribute('cy')) };
  }

  private readonly onDown = (ev: PointerEvent): void => {
    const target = (ev.target as Element | null)?.closest?.('[data-station]');
    if (!target || this.drag || ev.button !== 0) return;
    ev.preventDefault();
    this.drag = { index: Number(target.getAttribute('data-station')), pointer: ev.pointerId };
    try {
      this.svg.setPointerCapture(ev.pointerId);
    } catch {
      // A synthetic pointer cannot be captured; the drag still follows the strip's own events.
    }
    window.addEventListener('keydown', this.onKey, true);
  };

  private readonly onMove = (ev: PointerEvent): void => {
    const drag = this.drag, s = this.scale;
    if (!drag || !s || ev.pointerId !== drag.pointer) return;
    const box = this.svg.getBoundingClientRect();
    const x = ev.clientX - box.left, y = ev.clientY - box.top;
    const along = (x - s.left) / s.pxAlong;
    // The handle sits on the upper edge; its distance from the centre line is half the width, never through it.
    const width = (2 * Math.max(STATION_RADIUS_PX / 4, s.midY - y)) / s.pxAcross;
    this.handlers.onDrag(drag.index, along, width);
  };

  private readonly onUp = (ev: PointerEvent): void => {
    if (!this.drag || ev.pointerId !== this.drag.pointer) return;
    this.onMove(ev);
    this.end();
    this.handlers.onRelease();
  };

  private readonly onCancelled = (ev: PointerEvent): void => {
    if (!this.drag || ev.pointerId !== this.drag.pointer) return;
    this.end();
    this.handlers.onCancel();
  };

  private readonly onKey = (ev: KeyboardEvent): void => {
    if (ev.key !== 'Escape' || !this.drag) return;
    ev.stopPropagation();
    this.end();
    this.handlers.onCancel();
  };

  private end(): void {
    this.drag = null;
    window.removeEventListener('keydown', this.onKey, true);
    this.draw(true);
  }

  dispose(): void {
    this.resizeObserver.disconnect();
    window.removeEventListener('keydown', this.onKey, true);
    this.svg.remove();
  }
}
