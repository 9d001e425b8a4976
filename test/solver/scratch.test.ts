/** Work arrays kept between solves: handed out zeroed, one per slot and size, never shared with a result. */
import { describe, expect, it } from 'vitest';
import { ScratchArrays } from '../../src/solver/scratch.ts';
import { solveFlow } from '../../src/solver/solve.ts';
import { bend } from './rasterise/shapes.ts';

describe('ScratchArrays', () => {
  it('hands the same array back for the same slot and size, zeroed', () => {
    const scratch = new ScratchArrays();
    const a = scratch.float64('p', 8);
    a.fill(3);
    const b = scratch.float64('p', 8);
    expect(b).toBe(a);
    expect(Array.from(b)).toEqual(new Array(8).fill(0));
  });

  it('keeps slots apart, and two sizes per slot', () => {
    const scratch = new ScratchArrays();
    const small = scratch.uint8('mask', 4);
    const other = scratch.uint8('reached', 4);
    expect(other).not.toBe(small);
    const large = scratch.uint8('mask', 16);
    expect(scratch.uint8('mask', 4)).toBe(small);
    expect(scratch.uint8('mask', 16)).toBe(large);
    scratch.uint8('mask', 32); // a third size pushes out the least recent (4)
    expect(scratch.uint8('mask', 4)).not.toBe(small);
  });
});

describe('solveFlow with kept work arrays', () => {
  it('gives the same numbers on a repeat solve, and a later solve leaves an earlier result alone', () => {
    const first = solveFlow(bend(1, 2, 256), { targetCells: 4096 });
    const phi = Float64Array.from(first.phi);
    const speed = Float64Array.from(first.speedRatio);
    solveFlow(bend(1.2, 2, 256), { targetCells: 4096 }); // another shape on the same grid size
    expect(first.phi).toEqual(phi);
    expect(first.speedRatio).toEqual(speed);
    const again = solveFlow(bend(1, 2, 256), { targetCells: 4096 });
    expect(again.phi).toEqual(phi);
    expect(again.iterations).toBe(first.iterations);
    expect(again.conductance).toBe(first.conductance);
  });
});
