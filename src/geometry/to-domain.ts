/** Turns a section document into the solver's flow domain: flattened, filleted, checked, oriented and marked rings. */

import type { Edge, Section } from '../document/types.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL, type FlowDomain, type Ring } from '../solver/types.ts';
import { signedArea } from './area.ts';
import { checkRings, type NamedRing } from './domain-checks.ts';
import { GeometryError } from './errors.ts';
import { traceOutline, type TracedRing } from './trace-outline.ts';

/**
 * The flow domain of `section`, every chord within `toleranceLen` (document length units) of the true edges.
 * Outer ring counter-clockwise, islands clockwise. Marks come from edge roles; each distinct wall name gets one id
 * in `wallNames` (section walls in edge order first, then islands, whose walls all carry the island's name);
 * unnamed walls, inlets and outlets get -1. A fillet's two halves take the marks of the two edges it joins.
 * Each ring starts at vertex 0 of its outline (or at the tangent point after it, when vertex 0 is filleted).
 * `units` is the label used in error messages ("mm"; "units" when not given).
 * Throws GeometryError for any geometry the solver could not use (see GeometryErrorCode).
 */
export function sectionToDomain(section: Section, toleranceLen: number, units?: string): FlowDomain {
  if (!(toleranceLen > 0) || !Number.isFinite(toleranceLen)) {
    throw new GeometryError('bad-tolerance', `The flattening tolerance must be a positive length; got ${toleranceLen}.`);
  }
  const wallNames: string[] = [];
  const idOf = (name: string): number => {
    const found = wallNames.indexOf(name);
    return found >= 0 ? found : wallNames.push(name) - 1;
  };
  const outlineIds = section.outline.edges.map((edge) => (edgeMark(edge) === MARK_WALL && edge.wallName ? idOf(edge.wallName) : -1));
  const islandIds = section.islands.map((island) => idOf(island.name));

  const outer = traceOutline(section.outline, { tol: toleranceLen, units });
  const islands = section.islands.map((island) => traceOutline(island.outline, { tol: toleranceLen, islandName: island.name, units }));
  const named: NamedRing[] = [outer, ...islands.map((ring, i) => ({ ...ring, islandName: section.islands[i].name }))];
  checkRings(named, units);

  const outerMarks = section.outline.edges.map(edgeMark);
  return {
    outer: toRing(outer, +1, (e) => outerMarks[e], (e) => outlineIds[e]),
    islands: islands.map((ring, i) => toRing(ring, -1, () => MARK_WALL, () => islandIds[i])),
    wallNames,
  };
}

function edgeMark(edge: Edge): number {
  return edge.role === 'inlet' ? MARK_INLET : edge.role === 'outlet' ? MARK_OUTLET : MARK_WALL;
}

/** Builds a solver ring turning the way `sign` asks (+1 counter-clockwise), with per-segment marks and wall ids. */
function toRing(traced: TracedRing, sign: 1 | -1, markOf: (edge: number) => number, wallIdOf: (edge: number) => number): Ring {
  const flip = Math.sign(signedArea(traced.xy)) === -sign;
  const { xy, edgeOf } = flip ? reversed(traced) : traced;
  const n = edgeOf.length;
  const marks = new Uint8Array(n), wallIds = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    marks[k] = markOf(edgeOf[k]);
    wallIds[k] = wallIdOf(edgeOf[k]);
  }
  return { xy, marks, wallIds };
}

/** The same ring run the other way, still starting at point 0: new segment j is old segment n - 1 - j. */
function reversed(traced: TracedRing): TracedRing {
  const n = traced.edgeOf.length;
  const xy = new Float64Array(2 * n), edgeOf = new Int32Array(n);
  for (let j = 0; j < n; j++) {
    const old = (n - j) % n;
    xy[2 * j] = traced.xy[2 * old];
    xy[2 * j + 1] = traced.xy[2 * old + 1];
    edgeOf[j] = traced.edgeOf[n - 1 - j];
  }
  return { xy, edgeOf };
}
