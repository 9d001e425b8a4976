/** Holds where the view looks, refits it until the user takes over, and tells listeners when it moves. */

import type { SectionBounds, SectionToScreen } from './types.ts';
import { FIT_INSETS } from './view-style.ts';
import * as VT from './view-transform.ts';

export class ViewNavigator {
  state: VT.ViewState = { centreX: 0, centreY: 0, scale: 1, width: 1, height: 1 };
  /** Until the user pans or zooms, new content and resizes refit the view. */
  private userMoved = false;
  private readonly listeners = new Set<(t: SectionToScreen) => void>();
  private readonly changed: () => void;

  /** `changed` runs after every change of the view (the owner redraws). */
  constructor(changed: () => void) {
    this.changed = changed;
  }

  /** A move the user made (pan, zoom, pinch): automatic refitting stops. */
  userMove(next: VT.ViewState): void {
    this.userMoved = true;
    this.set(next);
  }

  /** Fit `bounds` into the free area and resume automatic refitting. */
  fit(bounds: SectionBounds | null): void {
    this.userMoved = false;
    if (bounds) this.set(VT.fitBounds(this.state, bounds, FIT_INSETS));
  }

  /** The section changed: refit unless the user has moved the view. */
  contentChanged(bounds: SectionBounds | null): void {
    if (!this.userMoved) this.fit(bounds);
  }

  resize(width: number, height: number, bounds: SectionBounds | null): void {
    this.state = VT.resized(this.state, width, height);
    if (!this.userMoved && bounds) this.state = VT.fitBounds(this.state, bounds, FIT_INSETS);
    this.set(this.state);
  }

  get transform(): SectionToScreen {
    return VT.affineOf(this.state);
  }

  listen(listener: (t: SectionToScreen) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  clear(): void {
    this.listeners.clear();
  }

  private set(next: VT.ViewState): void {
    this.state = next;
    const t = this.transform;
    for (const l of this.listeners) l(t);
    this.changed();
  }
}
