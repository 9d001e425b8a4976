/** Editor handles (corners, arc and curve points, fillet-radius handles) drawn as SVG above the field. */
import type { SectionToScreen } from './types.ts';

export type HandleStyle = 'corner' | 'point' | 'fillet' | 'part';

/** A handle to draw, section units. */
export interface HandleMark {
  readonly x: number;
  readonly y: number;
  readonly style: HandleStyle;
  readonly selected: boolean;
  /** Shown beside a selected handle, e.g. "R 4.0 mm". */
  readonly label?: string;
}

const SVG_NS = 'http://www.w3.org/2000/svg';
const RADIUS_PX: Readonly<Record<HandleStyle, number>> = { corner: 4.5, point: 4, fillet: 5, part: 6 };

export class HandleOverlay {
  private readonly svg: SVGSVGElement;
  private marks: readonly HandleMark[] = [];
  private transform: SectionToScreen = { scale: 1, offsetX: 0, offsetY: 0 };
  /** Markup of each handle's group as drawn. */
  private drawn: string[] = [];

  constructor(container: HTMLElement) {
    this.svg = document.createElementNS(SVG_NS, 'svg');
    this.svg.setAttribute('class', 'editor-overlay');
    this.svg.style.cssText = 'position:absolute;inset:0;width:100%;height:100%;pointer-events:none;z-index:3';
    container.appendChild(this.svg);
  }

  setHandles(marks: readonly HandleMark[]): void {
    this.marks = marks;
    this.draw();
  }

  setTransform(transform: SectionToScreen): void {
    this.transform = transform;
    this.draw();
  }

  /** Each handle is a group of its own, rewritten only when its markup changes: a drag step then touches one or two
   * small groups, not the whole layer (which the browser would lay out and paint again). */
  private draw(): void {
    const { scale, offsetX, offsetY } = this.transform;
    const markup = this.marks.map((m) => {
      const sx = offsetX + scale * m.x;
      const sy = offsetY - scale * m.y;
      const r = RADIUS_PX[m.style] + (m.selected ? 1.5 : 0);
      const fill = m.selected ? '#e8a33d' : m.style === 'fillet' ? '#1d2127' : '#f2f4f6';
      const stroke = m.style === 'fillet' ? '#e8a33d' : '#1d2127';
      const label = m.label
        ? `<text x="${sx + 9}" y="${sy - 9}" fill="#e8a33d" font-size="12" font-family="system-ui" paint-order="stroke" stroke="#15181d" stroke-width="3">${escapeText(m.label)}</text>`
        : '';
      return shape(m.style, sx, sy, r, fill, stroke) + label;
    });
    const groups = this.svg.children;
    while (groups.length > markup.length) groups[groups.length - 1].remove();
    while (groups.length < markup.length) this.svg.appendChild(document.createElementNS(SVG_NS, 'g'));
    markup.forEach((html, k) => {
      if (this.drawn[k] !== html) groups[k].innerHTML = html;
    });
    this.drawn = markup;
  }

  dispose(): void {
    this.svg.remove();
  }
}

/** Corners are squares, part handles (lift, valve axis) diamonds, the rest circles. */
function shape(style: HandleStyle, sx: number, sy: number, r: number, fill: string, stroke: string): string {
  if (style === 'corner') return `<rect x="${sx - r}" y="${sy - r}" width="${2 * r}" height="${2 * r}" fill="${fill}" stroke="${stroke}" stroke-width="1.5"/>`;
  if (style === 'part') return `<path d="M${sx} ${sy - r}L${sx + r} ${sy}L${sx} ${sy + r}L${sx - r} ${sy}Z" fill="${fill === '#f2f4f6' ? '#5ec8e5' : fill}" stroke="#15181d" stroke-width="1.5"/>`;
  return `<circle cx="${sx}" cy="${sy}" r="${r}" fill="${fill}" stroke="${stroke}" stroke-width="2"/>`;
}

function escapeText(text: string): string {
  return text.replace(/[&<>]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;' })[c] ?? c);
}
