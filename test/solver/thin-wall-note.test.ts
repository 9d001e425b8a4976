/** The thin-wall warning: place, thickness, the cell it is solved as, and which grid would resolve it. */
import { describe, expect, it } from 'vitest';
import { MAX_CELLS } from '../../src/solver/errors.ts';
import { thinWallNote } from '../../src/solver/thin-wall-note.ts';
import type { ThinWall } from '../../src/solver/types.ts';

const divider: ThinWall = { x: 40, y: 12, wallName: 'divider', thickness: 0.02, cellCount: 300, resolvingCells: 404_001 };
const APP_DETAILS = [
  { label: 'preview', cells: 60_000 },
  { label: 'standard', cells: 250_000 },
  { label: 'fine', cells: 1_000_000 },
];

describe('thinWallNote', () => {
  it('says where, how thin, what it is solved as, and the cell count that would resolve it (rounded up)', () => {
    expect(thinWallNote(divider, { units: 'mm', spacing: 0.05 })).toBe(
      'Wall "divider" is thinner than a grid cell near (40.0, 12.0) mm (about 0.02 mm thick): it is solved as a wall ' +
        'about one cell (0.05 mm) thick. A grid of about 410,000 cells would resolve it.',
    );
  });

  it('names the first of the offered grid details that resolves it, or says none does', () => {
    expect(thinWallNote(divider, { units: 'mm', spacing: 0.05, choices: APP_DETAILS })).toMatch(
      / thick\. The "fine" grid detail \(1,000,000 cells\) would resolve it\.$/,
    );
    const thinner = { ...divider, resolvingCells: 4_000_001 };
    expect(thinWallNote(thinner, { units: 'mm', spacing: 0.05, choices: APP_DETAILS })).toMatch(
      /None of the grid details would resolve it: thicken the wall in the drawing\.$/,
    );
  });

  it('asks for a thicker wall when no grid the solver can use resolves it, or the wall has no thickness', () => {
    const past = { ...divider, thickness: 0.001, resolvingCells: MAX_CELLS + 1 };
    expect(thinWallNote(past, { units: 'mm', spacing: 0.05 })).toMatch(/more than one solve can use: thicken the wall in the drawing\.$/);
    const none = { ...divider, thickness: 0, resolvingCells: Infinity };
    const note = thinWallNote(none, { units: 'mm', spacing: 0.05 });
    expect(note).toContain('(no thickness)');
    expect(note).toMatch(/No grid resolves a wall of no thickness: thicken the wall in the drawing\.$/);
  });

  it('gives places in inches to a thousandth', () => {
    const inch = { ...divider, x: 1.5, y: 0.25, thickness: 0.0008 };
    expect(thinWallNote(inch, { units: 'in', spacing: 0.002 })).toMatch(/^Wall "divider" is thinner than a grid cell near \(1\.500, 0\.250\) in \(about 0\.0008 in thick\): .*\(0\.002 in\) thick\./);
  });
});
