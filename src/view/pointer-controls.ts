/** Pan and zoom from the pointer: wheel zooms about the cursor, a drag pans, two fingers pinch. */

export interface PointerHandlers {
  /** False while the app wants no panning at all (e.g. a drawing tool is active). */
  panEnabled(): boolean;
  /** True when the app's editor takes this pointer (e.g. it went down on a handle); the view then leaves it alone. */
  claims(ev: PointerEvent): boolean;
  /** Move the picture by (dx, dy) CSS px. */
  pan(dx: number, dy: number): void;
  /** Zoom by `factor` about (px, py), CSS px from the container's top left. */
  zoom(factor: number, px: number, py: number): void;
}

/** Wheel zoom rate: about 2x per five notches of a mouse wheel (100 px each). */
const WHEEL_RATE = 0.0014;

export class PointerControls {
  private readonly target: HTMLElement;
  private readonly handlers: PointerHandlers;
  /** Pointers this view is tracking: id -> last position (CSS px in the container). */
  private readonly active = new Map<number, { x: number; y: number }>();
  private readonly listeners: [string, (ev: Event) => void, AddEventListenerOptions?][];

  constructor(target: HTMLElement, handlers: PointerHandlers) {
    this.target = target;
    this.handlers = handlers;
    this.listeners = [
      ['wheel', (ev) => this.onWheel(ev as WheelEvent), { passive: false }],
      ['pointerdown', (ev) => this.onDown(ev as PointerEvent)],
      ['pointermove', (ev) => this.onMove(ev as PointerEvent)],
      ['pointerup', (ev) => this.onUp(ev as PointerEvent)],
      ['pointercancel', (ev) => this.onUp(ev as PointerEvent)],
    ];
    for (const [type, fn, opts] of this.listeners) target.addEventListener(type, fn, opts);
    // The page must not scroll or zoom itself under a touch pan or pinch.
    target.style.touchAction = 'none';
  }

  private local(ev: MouseEvent): { x: number; y: number } {
    const r = this.target.getBoundingClientRect();
    return { x: ev.clientX - r.left, y: ev.clientY - r.top };
  }

  private onWheel(ev: WheelEvent): void {
    ev.preventDefault();
    // deltaMode 1 = lines, 2 = pages; bring both to px.
    const px = ev.deltaMode === 1 ? 16 : ev.deltaMode === 2 ? 400 : 1;
    const p = this.local(ev);
    this.handlers.zoom(Math.exp(-ev.deltaY * px * WHEEL_RATE), p.x, p.y);
  }

  private onDown(ev: PointerEvent): void {
    if (ev.defaultPrevented || !this.handlers.panEnabled()) return;
    if (ev.pointerType === 'mouse' && ev.button !== 0 && ev.button !== 1) return;
    if (this.handlers.claims(ev)) return;
    this.active.set(ev.pointerId, this.local(ev));
    // Keep receiving moves when the pointer leaves the view mid-drag; not all pointers can be captured.
    try {
      this.target.setPointerCapture(ev.pointerId);
    } catch {
      /* synthetic pointers have no capture; the drag still works inside the view */
    }
  }

  private onMove(ev: PointerEvent): void {
    const last = this.active.get(ev.pointerId);
    if (!last) return;
    const p = this.local(ev);
    if (this.active.size >= 2) {
      this.pinch(ev.pointerId, p);
      return;
    }
    this.active.set(ev.pointerId, p);
    this.handlers.pan(p.x - last.x, p.y - last.y);
  }

  /** Two pointers: zoom by the change in their distance about their midpoint, and pan with the midpoint. */
  private pinch(id: number, p: { x: number; y: number }): void {
    const [a, b] = [...this.active.entries()].slice(0, 2);
    const other = a[0] === id ? b[1] : a[1];
    const before = this.active.get(id)!;
    const d0 = Math.hypot(before.x - other.x, before.y - other.y);
    const d1 = Math.hypot(p.x - other.x, p.y - other.y);
    const m0 = { x: (before.x + other.x) / 2, y: (before.y + other.y) / 2 };
    const m1 = { x: (p.x + other.x) / 2, y: (p.y + other.y) / 2 };
    this.active.set(id, p);
    this.handlers.pan(m1.x - m0.x, m1.y - m0.y);
    if (d0 > 1 && d1 > 1) this.handlers.zoom(d1 / d0, m1.x, m1.y);
  }

  private onUp(ev: PointerEvent): void {
    if (!this.active.delete(ev.pointerId)) return;
    if (this.target.hasPointerCapture?.(ev.pointerId)) this.target.releasePointerCapture(ev.pointerId);
  }

  dispose(): void {
    for (const [type, fn, opts] of this.listeners) this.target.removeEventListener(type, fn, opts);
    this.active.clear();
  }
}
