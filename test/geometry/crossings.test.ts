import { describe, expect, it } from 'vitest';
import type { Point, Section } from '../../src/document/types.ts';
import { findCrossing, segmentIntersection } from '../../src/geometry/crossings.ts';
import { GeometryError } from '../../src/geometry/errors.ts';
import { sectionToDomain } from '../../src/geometry/to-domain.ts';
import { circleOutline, polygon, section } from './helpers.ts';

function errorOf(sec: Section, units?: string): GeometryError {
  try {
    sectionToDomain(sec, 0.01, units);
  } catch (e) {
    if (e instanceof GeometryError) return e;
    throw e;
  }
  throw new Error('expected a GeometryError');
}

const box = polygon([[0, 0], [40, 0], [40, 30], [0, 30]]);

describe('self-crossing', () => {
  it('a bow-tie crosses at the exact crossing point of its two diagonals, naming both edges', () => {
    // Edges 1 ((4, 0) -> (0, 2)) and 3 ((4, 2) -> (0, 0)) meet where y = (4 - x) / 2 = x / 2: (2, 1).
    const err = errorOf(section(polygon([[0, 0], [4, 0], [0, 2], [4, 2]])), 'mm');
    expect(err.code).toBe('self-crossing');
    expect(err.where).toEqual([2, 1]);
    expect([err.edgeIndex, err.otherEdgeIndex]).toEqual([1, 3]);
    expect(err.islandName).toBeUndefined();
    expect(err.message).toContain('Edges 2 and 4 of the section outline cross or touch at (2, 1) mm.');
  });

  it('a bow-tie island is named', () => {
    const err = errorOf(section(box, [{ name: 'guide boss', outline: polygon([[10, 10], [14, 10], [10, 12], [14, 12]]) }]));
    expect(err.code).toBe('self-crossing');
    expect(err.islandName).toBe('guide boss');
    expect(err.where).toEqual([12, 11]);
    expect(err.message).toContain('of island "guide boss"');
  });

  it('a corner resting on another edge counts (it pinches the passage): the touching point is given', () => {
    // Corner 4 at (5, 0) sits on edge 0, the floor.
    const err = errorOf(section(polygon([[0, 0], [10, 0], [10, 10], [6, 10], [5, 0], [4, 10], [0, 10]])));
    expect(err.code).toBe('self-crossing');
    expect(err.where).toEqual([5, 0]);
    expect(err.edgeIndex).toBe(0);
    expect([3, 4]).toContain(err.otherEdgeIndex);
  });

  it('an edge folding straight back over the one before it', () => {
    const err = errorOf(section(polygon([[0, 0], [10, 0], [5, 0]])));
    expect(err.code).toBe('self-crossing');
  });

  it('a curve edge looping across a straight edge names both edges of the document', () => {
    const outline = {
      vertices: [{ at: [0, 0] as Point }, { at: [10, 0] as Point }, { at: [10, 10] as Point }, { at: [0, 10] as Point }],
      edges: [
        { kind: 'line' as const, role: 'wall' as const },
        { kind: 'line' as const, role: 'wall' as const },
        { kind: 'curve' as const, role: 'wall' as const, via: [[5, -3] as Point] },
        { kind: 'line' as const, role: 'wall' as const },
      ],
    };
    const err = errorOf(section(outline));
    expect(err.code).toBe('self-crossing');
    expect([err.edgeIndex, err.otherEdgeIndex]).toEqual([0, 2]);
    expect(err.where![1]).toBeCloseTo(0, 12);
  });
});

describe('zero-length edges', () => {
  it('two corners at the same place name the first and its edge', () => {
    const err = errorOf(section(polygon([[0, 0], [10, 0], [10, 0], [0, 10]])));
    expect(err.code).toBe('zero-length');
    expect(err.vertexIndex).toBe(1);
    expect(err.edgeIndex).toBe(1);
    expect(err.where).toEqual([10, 0]);
    expect(err.message).toBe('Corners 2 and 3 of the section outline are at the same place, so edge 2 has no length; move or delete one of them.');
  });

  it('the closing edge (last corner on the first) wraps round', () => {
    const err = errorOf(section(box, [{ name: 'valve', outline: polygon([[5, 5], [9, 5], [9, 9], [5, 5]]) }]));
    expect(err.code).toBe('zero-length');
    expect(err.vertexIndex).toBe(3);
    expect(err.islandName).toBe('valve');
    expect(err.message).toContain('Corners 4 and 1 of island "valve"');
  });
});

describe('islands against the outline and each other', () => {
  it('an island poking through the outline', () => {
    const err = errorOf(section(box, [{ name: 'valve', outline: polygon([[35, 10], [45, 10], [45, 20], [35, 20]]) }]));
    expect(err.code).toBe('island-crossing');
    expect(err.islandName).toBeUndefined();
    expect(err.otherIslandName).toBe('valve');
    expect(err.edgeIndex).toBe(1);
    expect([[40, 10], [40, 20]]).toContainEqual(err.where);
    expect(err.message).toContain('The section outline (edge 2) and island "valve"');
  });

  it('two islands overlapping', () => {
    const err = errorOf(section(box, [
      { name: 'valve', outline: circleOutline(15, 15, 5) },
      { name: 'stem', outline: polygon([[18, 13], [25, 13], [25, 17], [18, 17]]) },
    ]));
    expect(err.code).toBe('island-crossing');
    expect(err.islandName).toBe('valve');
    expect(err.otherIslandName).toBe('stem');
  });

  it('an island outside the outline', () => {
    const err = errorOf(section(box, [{ name: 'stray', outline: polygon([[50, 5], [55, 5], [55, 9]]) }]));
    expect(err.code).toBe('island-outside');
    expect(err.islandName).toBe('stray');
    expect(err.where).toEqual([50, 5]);
  });

  it('an island inside another island', () => {
    const err = errorOf(section(box, [
      { name: 'valve', outline: polygon([[5, 5], [25, 5], [25, 25], [5, 25]]) },
      { name: 'seat', outline: polygon([[10, 10], [12, 10], [12, 12]]) },
    ]));
    expect(err.code).toBe('island-in-island');
    expect(err.islandName).toBe('seat');
    expect(err.otherIslandName).toBe('valve');
  });
});

describe('segment intersection and findCrossing on raw rings', () => {
  it('crossing, touching, parallel and apart', () => {
    expect(segmentIntersection([0, 0, 4, 4], [0, 4, 4, 0])).toEqual([2, 2]);
    expect(segmentIntersection([0, 0, 4, 0], [2, 0, 2, 5])).toEqual([2, 0]);
    expect(segmentIntersection([0, 0, 4, 0], [0, 1, 4, 1])).toBeNull();
    expect(segmentIntersection([0, 0, 1, 1], [3, 0, 2, 1])).toBeNull();
  });

  it('a clean square has no crossing; its segment indices stand in for edges', () => {
    expect(findCrossing([{ xy: Float64Array.of(0, 0, 1, 0, 1, 1, 0, 1) }])).toBeNull();
    const hit = findCrossing([{ xy: Float64Array.of(0, 0, 4, 0, 0, 2, 4, 2) }])!;
    expect([hit.edgeA, hit.edgeB, ...hit.point]).toEqual([1, 3, 2, 1]);
  });
});
