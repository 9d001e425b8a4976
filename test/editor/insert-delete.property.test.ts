import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Section } from '../../src/document/types.ts';
import { applyEdit } from '../../src/editor/edits.ts';
import { EditError } from '../../src/editor/errors.ts';
import { active, boxDocument } from './fixtures.ts';

/** Every coordinate of the outline, to compare shapes within rounding. */
function coordinates(section: Section): number[] {
  return section.outline.vertices.flatMap((v) => [...v.at]).concat(
    section.outline.edges.flatMap((e) => (e.kind === 'arc' ? [...e.through] : e.kind === 'curve' ? e.via.flatMap((p) => [...p]) : [])),
  );
}

describe('insert then delete (property)', () => {
  it('gives back the original outline for any point along any edge of the box', () => {
    const doc = boxDocument();
    const original = coordinates(active(doc));
    let refused = 0;
    fc.assert(fc.property(
      // Points on a 0.01 grid around the box (x -10..50, y -10..50); fc.double favours extremes that all project onto corners.
      fc.integer({ min: 0, max: 3 }), fc.integer({ min: -1000, max: 5000 }), fc.integer({ min: -1000, max: 5000 }),
      (edge, i, j) => {
        const x = i / 100, y = j / 100;
        let inserted;
        try {
          inserted = applyEdit(doc, 'insertVertex', { edge, at: [x, y] });
        } catch (e) {
          // Only a point whose nearest place on the edge is a corner may be refused.
          if (!(e instanceof EditError) || !/further from the ends/.test(e.message)) throw e;
          refused++;
          return true;
        }
        const back = active(applyEdit(inserted, 'deleteVertex', { vertex: edge + 1 }));
        expect(back.outline.edges.map((e) => [e.kind, e.role, e.wallName])).toEqual(active(doc).outline.edges.map((e) => [e.kind, e.role, e.wallName]));
        coordinates(back).forEach((c, k) => expect(Math.abs(c - original[k])).toBeLessThan(1e-9));
        return true;
      },
    ), { seed: 20260, numRuns: 300 });
    // Most random points project inside an edge; the rest must have been refused, not mangled.
    expect(refused).toBeLessThan(150);
  });
});
