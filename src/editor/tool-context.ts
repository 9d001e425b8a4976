/** What the drag tool needs to know about the app at each event. */

import type { Section } from '../document/types.ts';
import type { SnapSettings } from './snap.ts';

export interface ToolContext {
  /** The active section as it is now (after any drag-move the app has applied). */
  readonly section: Section;
  /** Pick slop, document units (the app converts its pixel slop with the view scale). */
  readonly tolerance: number;
  /** Snapping settings, or null/absent when snapping is off. */
  readonly snap?: SnapSettings | null;
}
