/** The plain warning for a wall thinner than a grid cell, shared by the command's report and the app's status line. */
import { MAX_CELLS } from './errors.ts';
import type { ThinWall } from './types.ts';

/** A grid the reader can pick, e.g. the app's grid detail "fine" at 1,000,000 cells. */
export interface GridChoice {
  readonly label: string;
  readonly cells: number;
}

export interface ThinWallNoteOptions {
  /** The document's length units, e.g. "mm". */
  readonly units: string;
  /** The solved grid's cell size, length units. */
  readonly spacing: number;
  /**
   * The grids on offer, coarsest first (the app's grid details). Without them the note names a cell count up to
   * the solver's MAX_CELLS (the command's --cells).
   */
  readonly choices?: readonly GridChoice[];
}

/**
 * Example: `Wall "divider" is thinner than a grid cell near (40.0, 12.0) mm (about 0.02 mm thick): it is solved as a
 * wall about one cell (0.05 mm) thick. A grid of about 410,000 cells would resolve it.`
 */
export function thinWallNote(wall: ThinWall, options: ThinWallNoteOptions): string {
  const { spacing } = options;
  // One spelling per unit on screen: the document's "inch" is shown "in".
  const units = options.units === 'inch' ? 'in' : options.units;
  const digits = units === 'mm' ? 1 : 3;
  const place = `(${wall.x.toFixed(digits)}, ${wall.y.toFixed(digits)}) ${units}`;
  const thick = wall.thickness > 0 ? `about ${twoFigures(wall.thickness)} ${units} thick` : 'no thickness';
  return (
    `Wall "${wall.wallName}" is thinner than a grid cell near ${place} (${thick}): ` +
    `it is solved as a wall about one cell (${twoFigures(spacing)} ${units}) thick. ${remedy(wall, options.choices)}`
  );
}

/** Which grid would resolve the wall, or that the drawing must change. */
function remedy(wall: ThinWall, choices: readonly GridChoice[] | undefined): string {
  const needed = wall.resolvingCells;
  if (!Number.isFinite(needed)) return 'No grid resolves a wall of no thickness: thicken the wall in the drawing.';
  if (choices !== undefined) {
    const choice = choices.find((c) => c.cells >= needed);
    if (choice !== undefined) return `The "${choice.label}" grid detail (${count(choice.cells)} cells) would resolve it.`;
    return 'None of the grid details would resolve it: thicken the wall in the drawing.';
  }
  if (needed > MAX_CELLS) return `It would take about ${count(roundUp(needed))} cells to resolve, more than one solve can use: thicken the wall in the drawing.`;
  return `A grid of about ${count(Math.min(MAX_CELLS, roundUp(needed)))} cells would resolve it.`;
}

/** Rounded up to two significant figures, so the count is easy to type and still enough. */
function roundUp(cells: number): number {
  const step = 10 ** Math.max(0, Math.floor(Math.log10(cells)) - 1);
  return Math.ceil(cells / step) * step;
}

function count(cells: number): string {
  return Math.round(cells).toLocaleString('en-US');
}

function twoFigures(value: number): string {
  return String(Number(value.toPrecision(2)));
}
