/** Section files with a width profile for the study tests: a straight channel drawn as a porter would draw it. */

import type { SolveResult } from '../../src/solver/types.ts';

/**
 * A straight channel [0, L] x [0, H] in millimetres (inlet at x = 0, outlet at x = L, floor and roof walls) as a
 * format-version-5 file, with `width` as its variant's width profile (left out when undefined).
 */
export function channelFile(lengthL: number, heightH: number, width?: unknown): string {
  const section = {
    outline: {
      vertices: [{ at: [0, 0] }, { at: [lengthL, 0] }, { at: [lengthL, heightH] }, { at: [0, heightH] }],
      edges: [
        { kind: 'line', role: 'wall', wallName: 'floor' },
        { kind: 'line', role: 'outlet' },
        { kind: 'line', role: 'wall', wallName: 'roof' },
        { kind: 'line', role: 'inlet' },
      ],
    },
    islands: [],
  };
  const variant = width === undefined ? { name: 'base', section } : { name: 'base', width, section };
  return JSON.stringify({
    format: 'portwright-section', version: 5, title: 'Straight channel', units: 'mm', activeVariant: 'base',
    settings: { gridDetail: 'standard' }, variants: [variant],
  });
}

/** Calls `visit` with the centre and index of every solved cell. */
export function forEachSolved(result: SolveResult, visit: (x: number, y: number, c: number) => void): void {
  const { nx, ny, h, x0, y0 } = result.grid;
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) if (Number.isFinite(result.phi[i + j * nx])) visit(x0 + (i + 0.5) * h, y0 + (j + 0.5) * h, i + j * nx);
  }
}

/** |a / b - 1|. */
export function relativeError(a: number, b: number): number {
  return Math.abs(a / b - 1);
}
