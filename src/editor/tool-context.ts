/** What the drag tool needs to know about the app at each event. */

import type { Parts, Section } from '../document/types.ts';
import type { SnapSettings } from './snap.ts';

export interface ToolContext {
  /** The active section as it is now (after any drag-move the app has applied). */
  readonly section: Section;
  /**
   * The active variant's parametric parts as they are now (`activeVariant(doc).parts`). With them, generated geometry
   * cannot be grabbed and the valve's lift and axis handles can; absent, the tool sees only the section.
   */
  readonly parts?: Parts;
  /** Pick slop, document units (the app converts its pixel slop with the view scale). */
  readonly tolerance: number;
  /** Snapping settings, or null/absent when snapping is off. */
  readonly snap?: SnapSettings | null;
}
