/** The facts `check` reports about one section: edge counts, islands, walls, and the fluid area from the geometry kernel. */

import type { Section } from '../document/types.ts';
import { GeometryError, defaultTolerance, regionArea, sectionToDomain } from '../geometry/index.ts';

export interface SectionSummary {
  readonly outlineEdges: number;
  readonly inletEdges: number;
  readonly outletEdges: number;
  readonly islandEdges: number;
  readonly islandNames: readonly string[];
  /** Distinct wall names as the solver sees them (section walls in edge order, then islands by name). */
  readonly wallNames: readonly string[];
  /** Outline minus islands, document units squared; undefined when the geometry has a problem. */
  readonly fluidArea: number | undefined;
  /** Plain descriptions of what keeps the section from being solved; empty when it is fine. */
  readonly problems: readonly string[];
}

/** Summarises `section`; geometry problems are reported, not thrown (any other error is a fault and is thrown). */
export function summariseSection(section: Section, units: string): SectionSummary {
  const roles = section.outline.edges.map((edge) => edge.role);
  const inletEdges = roles.filter((role) => role === 'inlet').length;
  const outletEdges = roles.filter((role) => role === 'outlet').length;
  const problems: string[] = [];
  if (inletEdges === 0) problems.push('the outline has no inlet edge (role "inlet", the manifold face): the flow has nowhere to enter');
  if (outletEdges === 0) problems.push('the outline has no outlet edge (role "outlet", the far end of the bore): the flow has nowhere to leave');
  let wallNames: readonly string[] = [];
  let fluidArea: number | undefined;
  try {
    const domain = sectionToDomain(section, defaultTolerance(section), units);
    wallNames = domain.wallNames;
    fluidArea = regionArea(domain);
  } catch (error) {
    if (!(error instanceof GeometryError)) throw error;
    problems.push(error.message);
  }
  return {
    outlineEdges: roles.length,
    inletEdges,
    outletEdges,
    islandEdges: section.islands.reduce((n, island) => n + island.outline.edges.length, 0),
    islandNames: section.islands.map((island) => island.name),
    wallNames,
    fluidArea,
    problems,
  };
}
