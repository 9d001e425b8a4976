import { describe, expect, it } from 'vitest';
import { roundToStep, snapNeighbours, snapPoint } from '../../src/editor/snap.ts';
import { boxSection } from './fixtures.ts';

describe('snapPoint', () => {
  it('snaps each coordinate to the grid', () => {
    expect(snapPoint([10.23, 4.76], { gridStep: 0.5 })).toEqual({
      at: [10, 5], x: { kind: 'grid', step: 0.5 }, y: { kind: 'grid', step: 0.5 },
    });
    // Inch documents: 0.02 steps come out tidy, not 0.30000000000000004.
    expect(snapPoint([0.305, -0.011], { gridStep: 0.02 }).at).toEqual([0.3, -0.02]);
  });

  it('lines up with the nearest neighbour within the tolerance before the grid', () => {
    const result = snapPoint([10.23, 4.9], { gridStep: 0.5, alignTolerance: 0.3 }, [[12, 5.1], [30, 4.85]]);
    expect(result.at).toEqual([10, 4.85]);
    expect(result.x).toEqual({ kind: 'grid', step: 0.5 });
    expect(result.y).toEqual({ kind: 'aligned', with: [30, 4.85] });
    const vertical = snapPoint([39.8, 12.34], { alignTolerance: 0.3 }, [[40, 0], [40, 30]]);
    expect(vertical.at).toEqual([40, 12.34]);
    expect(vertical.x).toEqual({ kind: 'aligned', with: [40, 0] });
    expect(vertical.y).toEqual({ kind: 'free' });
  });

  it('leaves the point alone when nothing is near and there is no grid', () => {
    expect(snapPoint([1.234, 5.678], { alignTolerance: 0.1 }, [[3, 3]])).toEqual({
      at: [1.234, 5.678], x: { kind: 'free' }, y: { kind: 'free' },
    });
    expect(snapPoint([1.234, 5.678], {}).at).toEqual([1.234, 5.678]);
  });

  it('rounds to the nearest multiple of the step, halves upward', () => {
    expect(roundToStep(0.25, 0.5)).toBe(0.5);
    expect(roundToStep(-0.26, 0.5)).toBe(-0.5);
  });
});

describe('snapNeighbours', () => {
  const section = boxSection();
  it('gives a corner its two neighbouring corners, wrapping round the outline', () => {
    expect(snapNeighbours(section, { kind: 'vertex', vertex: 0 })).toEqual([[0, 30], [40, 0]]);
    expect(snapNeighbours(section, { kind: 'vertex', vertex: 1, island: 0 })).toEqual([[15, 10], [20, 18]]);
  });

  it('gives a through point its edge ends and a via point its ends and neighbouring vias', () => {
    expect(snapNeighbours(section, { kind: 'through', edge: 2 })).toEqual([[40, 30], [0, 30]]);
    expect(snapNeighbours(section, { kind: 'via', edge: 1, via: 0, island: 0 })).toEqual([[25, 10], [20, 18], [22, 17]]);
    expect(snapNeighbours(section, { kind: 'vertex', vertex: 9 })).toEqual([]);
  });
});
