/** Test fixture: the exact speed field of a concentric bend (free vortex), on a grid, for the view's checks. */

import type { FieldImage, FluidClip, WallLine } from '../../src/view/types.ts';

/**
 * Annular sector r1 < r < r2 in the first quadrant (90 deg turn), centred on the origin, section units.
 * Speed u = K / r; as a ratio to the mean speed over a radial cut, u / U = (r2 - r1) / (r ln(r2 / r1)).
 * [derived; classical free-vortex result, REFERENCES.md 1a]
 */
export interface Bend {
  readonly r1: number;
  readonly r2: number;
}

export function bendSpeedRatio(bend: Bend, r: number): number {
  return (bend.r2 - bend.r1) / (r * Math.log(bend.r2 / bend.r1));
}

export function insideBend(bend: Bend, x: number, y: number): boolean {
  const r = Math.hypot(x, y);
  return x >= 0 && y >= 0 && r >= bend.r1 && r <= bend.r2;
}

/** The bend sampled at cell centres with cell size h; NaN where the centre is outside the sector. */
export function bendField(bend: Bend, h: number): FieldImage {
  const margin = 2 * h;
  const x0 = -margin;
  const y0 = -margin;
  const nx = Math.ceil((bend.r2 + 2 * margin) / h);
  const ny = nx;
  const values = new Float32Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const x = x0 + (i + 0.5) * h;
      const y = y0 + (j + 0.5) * h;
      values[i + j * nx] = insideBend(bend, x, y) ? bendSpeedRatio(bend, Math.hypot(x, y)) : NaN;
    }
  }
  return { nx, ny, x0, y0, h, values };
}

/** Arc from angle a0 to a1 (radians) at radius r as flat x, y pairs, `steps` segments. */
export function arcXY(r: number, a0: number, a1: number, steps: number): number[] {
  const xy: number[] = [];
  for (let k = 0; k <= steps; k++) {
    const a = a0 + ((a1 - a0) * k) / steps;
    xy.push(r * Math.cos(a), r * Math.sin(a));
  }
  return xy;
}

/** The sector's outline, counter-clockwise: outlet cut on y = 0, outer arc, inlet cut on x = 0, inner arc back. */
export function bendClip(bend: Bend): FluidClip {
  const outer = arcXY(bend.r2, 0, Math.PI / 2, 90);
  const inner = arcXY(bend.r1, Math.PI / 2, 0, 90);
  return { outer: { xy: Float64Array.from([...outer, ...inner]), closed: true }, holes: [] };
}

/** Walls of the bend, named as a porter would: the inner arc is the short side. */
export function bendWalls(bend: Bend): WallLine[] {
  return [
    { name: 'short side', kind: 'wall', xy: Float64Array.from(arcXY(bend.r1, 0, Math.PI / 2, 90)) },
    { name: 'long side', kind: 'wall', xy: Float64Array.from(arcXY(bend.r2, 0, Math.PI / 2, 90)) },
    { name: 'inlet', kind: 'inlet', xy: Float64Array.from([0, bend.r1, 0, bend.r2]) },
    { name: 'outlet', kind: 'outlet', xy: Float64Array.from([bend.r1, 0, bend.r2, 0]) },
  ];
}
