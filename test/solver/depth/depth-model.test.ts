/** The passage depth model: evaluation, checks and exact line integrals. */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkDepth, depthFunction } from '../../../src/solver/depth/depth-model.ts';
import { inletSize, segmentDepthIntegral } from '../../../src/solver/depth/depth-integral.ts';
import { FlowSetupError } from '../../../src/solver/errors.ts';
import type { SampledDepth } from '../../../src/solver/types.ts';
import { solveFlow } from '../../../src/solver/solve.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../../src/solver/types.ts';
import { domainOf, ringOf, type Pt } from '../rasterise/shapes.ts';
import { channelWithDepth, roundPipe, X_AXIS } from './depth-shapes.ts';

const LATTICE: SampledDepth = { kind: 'sampled', x0: 1, y0: 2, dx: 2, dy: 1, nx: 3, ny: 2, values: Float64Array.of(1, 2, 4, 3, 5, 9) };

describe('depth model', () => {
  it('is 2 pi r about an axis in any direction', () => {
    expect(depthFunction(X_AXIS)(3, 2)).toBeCloseTo(4 * Math.PI, 12);
    expect(depthFunction(X_AXIS)(3, -2)).toBeCloseTo(4 * Math.PI, 12);
    // axis through (1, 1) along (1, 1): the point (0, 2) lies sqrt(2) from it
    const slanted = depthFunction({ kind: 'axisymmetric', axis: { x: 1, y: 1, dirX: 3, dirY: 3 } });
    expect(slanted(0, 2)).toBeCloseTo(2 * Math.PI * Math.SQRT2, 12);
  });

  it('is bilinear between lattice nodes and held at the edge beyond them', () => {
    const b = depthFunction(LATTICE);
    expect(b(1, 2)).toBe(1);
    expect(b(5, 3)).toBe(9);
    expect(b(2, 2.5)).toBeCloseTo(0.25 * (1 + 2 + 3 + 5), 12);
    expect(b(-10, 2)).toBe(1);
    expect(b(100, 100)).toBe(9);
    expect(b(4, 100)).toBeCloseTo(7, 12);
    const flat = depthFunction({ kind: 'sampled', x0: 0, y0: 0, dx: 1, dy: 1, nx: 1, ny: 1, values: Float64Array.of(2.5) });
    expect(flat(-3, 7)).toBe(2.5);
  });

  it('refuses a width of zero or less with the place and two whole sentences', () => {
    const bad = { ...LATTICE, values: Float64Array.of(1, 2, 4, 3, 0, 9) };
    const error = catchError(() => checkDepth(channelWithDepth(4, 1, bad))) as FlowSetupError;
    expect(error).toBeInstanceOf(FlowSetupError);
    expect(error.code).toBe('depth');
    expect(error.where).toEqual([3, 3]);
    expect(error.message).toBe('The passage width is 0.0 at (3.0, 3.0). Every width along the port must be more than zero.');
  });

  it('refuses a round section that crosses its axis, and a malformed lattice or axis as a caller error', () => {
    const crossing = { ...roundPipe(4, 1), depth: { kind: 'axisymmetric', axis: { x: 0, y: 0.5, dirX: 1, dirY: 0 } } } as const;
    const error = catchError(() => checkDepth(crossing)) as FlowSetupError;
    expect(error.code).toBe('depth');
    expect(error.message).toMatch(/^The section crosses the axis it turns about\. [^.]+\.$/);
    expect(() => checkDepth(roundPipe(4, 1))).not.toThrow();
    expect(() => checkDepth(channelWithDepth(4, 1, { ...LATTICE, nx: 4 }))).toThrow(RangeError);
    expect(() => checkDepth(channelWithDepth(4, 1, { ...LATTICE, dx: 0 }))).toThrow(RangeError);
    expect(() => checkDepth({ ...roundPipe(4, 1), depth: { kind: 'axisymmetric', axis: { x: 0, y: 0, dirX: 0, dirY: 0 } } })).toThrow(RangeError);
  });
});

describe('depth integrals', () => {
  it('gives a round inlet of radius R the area pi R^2 [derived]', () => {
    expect(inletSize(roundPipe(4, 1.5))).toBeCloseTo(Math.PI * 1.5 * 1.5, 12);
    expect(segmentDepthIntegral(X_AXIS, 0, -1, 0, 2)).toBeCloseTo(2 * Math.PI * (0.5 + 2), 12); // both sides of the axis
    expect(inletSize(channelWithDepth(4, 1, undefined))).toBe(1);
  });

  it('refuses, through the solve, an inlet that lies on the axis (no area) and a width of zero', () => {
    const pts: Pt[] = [[0, 0], [4, 0], [4, 1], [0, 1]];
    const onAxis = { ...domainOf(ringOf(pts, [MARK_INLET, MARK_OUTLET, MARK_WALL, MARK_WALL])), depth: X_AXIS };
    const error = catchError(() => solveFlow(onAxis, { targetCells: 4096 })) as FlowSetupError;
    expect(error.code).toBe('depth');
    expect(error.message).toMatch(/^The inlet has no area: [^.]+\.$/);
    const zero = { kind: 'sampled', x0: 0, y0: 0, dx: 4, dy: 1, nx: 2, ny: 1, values: Float64Array.of(1, -1) } as const;
    expect(() => solveFlow(channelWithDepth(4, 1, zero), { targetCells: 4096 })).toThrow(FlowSetupError);
  });

  it('integrates the sampled depth exactly: against fine midpoint sums on random segments (fast-check, seed 12)', () => {
    const b = depthFunction(LATTICE);
    const point = fc.tuple(fc.double({ min: -2, max: 8, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }));
    fc.assert(
      fc.property(point, point, ([ax, ay], [bx, by]) => {
        const steps = 20_000;
        let sum = 0;
        for (let k = 0; k < steps; k++) {
          const t = (k + 0.5) / steps;
          sum += b(ax + t * (bx - ax), ay + t * (by - ay));
        }
        const length = Math.hypot(bx - ax, by - ay);
        const exact = segmentDepthIntegral(LATTICE, ax, ay, bx, by);
        expect(Math.abs(exact - (sum / steps) * length)).toBeLessThanOrEqual(1e-6 * (1 + length));
      }),
      { seed: 12, numRuns: 60 },
    );
  });
});

function catchError(run: () => void): unknown {
  try {
    run();
  } catch (error) {
    return error;
  }
  throw new Error('expected an error');
}
