/** `solve` on a U-bend drawn in the file format with a divider thinner than a cell: no leak, and a plain warning. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';
import { captureIO, tempDir } from './helpers.ts';
import { uBendFile } from '../study/drawn-shapes.ts';

const tmp = tempDir();
afterAll(() => tmp.cleanup());

/**
 * 30,000 cells over 20 x 2.02 mm: h = 0.0367 mm, so the 0.02 mm divider (y 1..1.02) lies inside one row of cells
 * (grid lines at y = 27 h = 0.991 and 28 h = 1.027) while the 0.2 mm divider is more than 5 cells thick. [derived from frame.ts]
 */
const CELLS = '30000';
type Json = any;
const reports: Record<string, Json> = {};
let thinText = '';

beforeAll(async () => {
  for (const divider of [0.02, 0.2]) {
    const file = tmp.write(`u-bend-${divider}.json`, uBendFile(divider));
    const io = captureIO();
    expect(await run(['solve', file, '--cells', CELLS, '--json'], io)).toBe(0);
    reports[divider] = JSON.parse(io.stdout.join('\n'));
    if (divider === 0.02) {
      const text = captureIO();
      expect(await run(['solve', file, '--cells', CELLS], text)).toBe(0);
      thinText = text.stdout.join('\n');
    }
  }
}, 60_000);

describe('solve: a divider thinner than a grid cell', () => {
  it('does not leak: the 0.02 and 0.2 mm dividers give conductances within 1% (about 60x apart when the cells joined both sides)', () => {
    const thin = reports[0.02].conductance;
    const thick = reports[0.2].conductance;
    expect(Math.abs(thin / thick - 1)).toBeLessThan(0.01);
  });

  it('reports the thin divider once, by name, with its thickness and the grid that would resolve it', () => {
    const walls = reports[0.02].thinWalls;
    expect(walls).toHaveLength(1);
    expect(walls[0].wallName).toBe('divider');
    expect(walls[0].thickness).toBeCloseTo(0.02, 6);
    // Placed half way along the divider's thinnest cells, not at its root.
    expect(walls[0].x).toBeGreaterThan(5);
    expect(walls[0].x).toBeLessThan(15);
    expect(walls[0].y).toBeGreaterThan(0.98);
    expect(walls[0].y).toBeLessThan(1.04);
    expect(walls[0].cellCount).toBeGreaterThan(400);
    // h <= 0.01 mm over 20 x 2.02 mm: 4 * 40.4 / 0.02^2 = 404,000 cells (and a hair for rounding). [derived]
    expect(walls[0].resolvingCells).toBeGreaterThanOrEqual(404_000);
    expect(walls[0].resolvingCells).toBeLessThan(404_100);
    expect(reports[0.2].thinWalls).toEqual([]);
  });

  it('prints a plain warning naming the wall, its place and thickness, the cell it is solved as and the grid to use', () => {
    expect(thinText).toMatch(
      /  warning: Wall "divider" is thinner than a grid cell near \(9\.5, 1\.0\) mm \(about 0\.02 mm thick\): it is solved as a wall about one cell \(0\.037 mm\) thick\. A grid of about 410,000 cells would resolve it\./,
    );
  });
});
