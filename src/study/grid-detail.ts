/** Cell counts behind each grid detail setting, and the coarse grid used while dragging. */
import type { GridDetail } from '../document/types.ts';

/** Target cells over the section's bounding box. */
export const CELLS_BY_DETAIL: Readonly<Record<GridDetail, number>> = {
  preview: 60_000,
  standard: 250_000,
  fine: 1_000_000,
};

/** While a point is dragged: small enough to re-solve at interaction speed. */
export const DRAG_CELLS = 30_000;
