/** Small invented section documents for the editor tests, and a deep freeze to prove edits never mutate. */

import { expect } from 'vitest';
import type { PortDocument, Section } from '../../src/document/types.ts';

/**
 * A 40 x 30 box traced counter-clockwise: floor wall, outlet on the right, an arc roof, inlet on the left;
 * corner 1 carries a 3-unit fillet. One triangular island inside. All numbers invented.
 */
export function boxSection(): Section {
  return {
    outline: {
      vertices: [{ at: [0, 0] }, { at: [40, 0], filletRadius: 3 }, { at: [40, 30] }, { at: [0, 30] }],
      edges: [
        { kind: 'line', role: 'wall', wallName: 'floor' },
        { kind: 'line', role: 'outlet' },
        // Roof: arc of the circle centred (20, 15) through the top, radius 25: (20, 40) is its middle.
        { kind: 'arc', role: 'wall', wallName: 'roof', through: [20, 40] },
        { kind: 'line', role: 'inlet' },
      ],
    },
    islands: [{
      name: 'valve head',
      outline: {
        vertices: [{ at: [15, 10] }, { at: [25, 10] }, { at: [20, 18] }],
        edges: [
          { kind: 'line', role: 'wall' },
          { kind: 'curve', role: 'wall', via: [[23, 15], [22, 17]] },
          { kind: 'line', role: 'wall' },
        ],
      },
    }],
  };
}

export function boxDocument(): PortDocument {
  return deepFreeze({
    format: 'portwright-section',
    version: 5,
    title: 'Test box',
    units: 'mm',
    variants: [
      { name: 'stock', section: boxSection() },
      { name: 'opened roof', note: 'invented alternative', section: boxSection() },
    ],
    activeVariant: 'stock',
    settings: { gridDetail: 'standard' },
  });
}

/** Freezes every object and array reachable from `value`, so any mutation throws in strict-mode code. */
export function deepFreeze<T>(value: T): T {
  if (value !== null && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const key of Object.keys(value)) deepFreeze((value as Record<string, unknown>)[key]);
  }
  return value;
}

/** The active variant's section of a document. */
export function active(doc: PortDocument): Section {
  const variant = doc.variants.find((v) => v.name === doc.activeVariant);
  if (variant === undefined) throw new Error('no active variant');
  return variant.section;
}

/** Approximate comparison for computed coordinates: each number within `delta`. */
export function expectPointNear(actual: readonly number[], expected: readonly number[], delta = 1e-9): void {
  expect(actual.length).toBe(expected.length);
  actual.forEach((a, k) => expect(Math.abs(a - expected[k]), `[${actual.join(', ')}] vs [${expected.join(', ')}]`).toBeLessThanOrEqual(delta));
}
