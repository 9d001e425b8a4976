/** The passage depth read cell by cell: the depth at each cell centre, and the port volume above the deck. */
import { depthFunction } from '../depth/depth-model.ts';
import type { CutGrid, DepthModel } from '../types.ts';
import { pastDeck } from './deck.ts';
import type { DeckLine, PassageModel } from './types.ts';

/** Which model a depth stands for: none is the plane (per unit depth), a sampled one a width profile. */
export function passageModel(depth: DepthModel | undefined): PassageModel {
  if (depth === undefined) return 'plane';
  return depth.kind === 'axisymmetric' ? 'axisymmetric' : 'width';
}

/**
 * The depth at every fluid cell's centre (document units, row-major i + j * nx, 0 outside the fluid), or null
 * without a depth (unit depth everywhere: callers weight by 1).
 */
export function cellDepths(grid: CutGrid, depth: DepthModel | undefined): Float64Array | null {
  if (depth === undefined) return null;
  const { nx, ny, h, x0, y0 } = grid;
  const at = depthFunction(depth);
  const out = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    for (let i = 0, c = j * nx; i < nx; i++, c++) if (grid.cellFraction[c] > 0) out[c] = at(x0 + (i + 0.5) * h, y0 + (j + 0.5) * h);
  }
  return out;
}

/**
 * Port volume: the sum over fluid cells whose centre is not past `deck` of cell fraction x h^2 x depth at the centre,
 * document units cubed (the port and bowl; the test bore is not the port). Without a depth it is the fluid area
 * above the deck times a unit depth, document units squared. Every fluid cell counts, a pocket the flow does not
 * reach too: it is metal the porter has removed all the same.
 * Example: a 4 x 1 channel with the depth 1 + x / 4 holds 4 x 1.5 = 6.
 * @param depth depth at cell centres as cellDepths gives it, or null for unit depth
 */
export function portVolume(grid: CutGrid, depth: Float64Array | null, deck: DeckLine | null): number {
  const { nx, ny, h, x0, y0 } = grid;
  let sum = 0;
  for (let j = 0; j < ny; j++) {
    for (let i = 0, c = j * nx; i < nx; i++, c++) {
      const f = grid.cellFraction[c];
      if (!(f > 0)) continue;
      if (deck !== null && pastDeck(deck, x0 + (i + 0.5) * h, y0 + (j + 0.5) * h) > 0) continue;
      sum += f * (depth === null ? 1 : depth[c]);
    }
  }
  return sum * h * h;
}
