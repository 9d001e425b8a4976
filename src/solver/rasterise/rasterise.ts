/** Cut-cell rasterisation of a flow domain: area fractions, face open fractions and inlet/outlet couplings. */
import { cellFractions } from './area.ts';
import { bounds, checkDomain, checkInletSpan } from './checks.ts';
import { couplings } from './coupling.ts';
import { faceFractions } from './faces.ts';
import { gridFrame, toGridRings } from './frame.ts';
import { findSplitCells, keepLargestPieces } from './split-cells.ts';
import { thinWallsOf } from './thin-wall-report.ts';
import type { FlowDomain, RasterGrid } from '../types.ts';
import { checkDepth, depthFunction } from '../depth/depth-model.ts';
import { faceConductances, gridDepth } from '../depth/face-conductance.ts';
import { checkEndAreas } from '../depth/depth-integral.ts';

/**
 * Lays a square grid over the domain and measures it exactly.
 * Cell size h = sqrt(bounding-box area / targetCells), with one spare cell around the box
 * (so the box's lower-left corner is grid node (1, 1)). Area and face fractions come from exact clipping
 * of the rings against the grid, not from sampling cell centres.
 *
 * A cell that a wall thinner than a cell crosses holds fluid on both sides of it; it keeps only its largest
 * piece (split-cells.ts), so the wall never leaks, and the wall is listed in `thinWalls`.
 *
 * Units for the finite-volume balance: a face's conductance is its open fraction (open length / centre
 * spacing h), the same dimensionless units as the inlet and outlet couplings.
 * Guarantees, so the solver need not re-check: every fraction is in 0..1; a face is open only if both
 * cells beside it hold fluid; a coupling is non-zero only in a cell holding fluid.
 * Memory: five Float64 arrays of about nx * ny (40 bytes a cell); two more with a depth.
 *
 * With a passage depth (domain.depth) the couplings carry the depth at each inlet and outlet piece's midpoint and
 * the grid gains conductanceX and conductanceY (open fraction times the depth at each face's midpoint).
 *
 * Throws FlowSetupError for a section the solver cannot use (see checks.ts).
 * Example: a 4 x 1 channel at targetCells 64 gives h = 0.25, nx = 18, ny = 6.
 */
export function rasterise(domain: FlowDomain, targetCells: number): RasterGrid {
  checkDomain(domain, targetCells);
  checkDepth(domain);
  checkEndAreas(domain);
  const box = bounds(domain);
  const frame = gridFrame(box, targetCells);
  checkInletSpan(domain, frame.h);
  const { nx, ny } = frame;
  const rings = toGridRings(domain, frame);
  const cellFraction = cellFractions(rings, nx, ny);
  const { openX, openY } = faceFractions(rings, cellFraction, nx, ny);
  const depth = domain.depth === undefined ? null : gridDepth(depthFunction(domain.depth), frame);
  const { inletCoupling, outletCoupling, touched } = couplings(rings, cellFraction, nx, ny, depth);
  const split = findSplitCells(rings, cellFraction, nx, ny);
  const thinWalls = thinWallsOf(split, rings, domain.wallNames, frame, (box[2] - box[0]) * (box[3] - box[1]));
  keepLargestPieces(split, rings, { cellFraction, openX, openY, inletCoupling, outletCoupling }, nx, depth);
  // A split cell keeps a share of its own couplings, so no cell outside `touched` gains one.
  const coupledCells = Int32Array.from(new Set(touched)).sort().filter((k) => inletCoupling[k] + outletCoupling[k] > 0);
  const grid = { ...frame, cellFraction, openX, openY, inletCoupling, outletCoupling, coupledCells, thinWalls };
  return depth === null ? grid : { ...grid, ...faceConductances(frame, openX, openY, depth) };
}
