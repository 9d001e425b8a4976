/** The facts `check` reports about one variant: edge counts, islands, walls, and the fluid area from the geometry kernel. */

import type { PortDocument, Variant } from '../document/types.ts';
import { GeometryError, regionArea } from '../geometry/index.ts';
import { PartsError } from '../parts/index.ts';
import { missingEnds } from '../study/index.ts';
import { variantDomain } from './variant-domain.ts';

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

/**
 * Summarises `variant`: counts of the section as stored in the file; walls, area and problems of the domain `solve`
 * would solve (parts regenerated), so check and solve agree. Geometry and parts problems are reported, not thrown
 * (any other error is a fault and is thrown).
 */
export function summariseVariant(variant: Variant, document: PortDocument): SectionSummary {
  const section = variant.section;
  const roles = section.outline.edges.map((edge) => edge.role);
  const inletEdges = roles.filter((role) => role === 'inlet').length;
  const outletEdges = roles.filter((role) => role === 'outlet').length;
  const problems = missingEnds(variant);
  let wallNames: readonly string[] = [];
  let fluidArea: number | undefined;
  try {
    const domain = variantDomain(variant, document);
    wallNames = domain.wallNames;
    fluidArea = regionArea(domain);
  } catch (error) {
    if (!(error instanceof GeometryError) && !(error instanceof PartsError)) throw error;
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
