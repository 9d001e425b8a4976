/** Whether a variant's outline has somewhere for the flow to enter and leave, in the words check and the app both use. */

import type { Variant } from '../document/types.ts';

/** Plain sentences for a missing inlet and a missing outlet edge; empty when the outline has both. */
export function missingEnds(variant: Variant): string[] {
  const roles = variant.section.outline.edges.map((edge) => edge.role);
  const problems: string[] = [];
  if (!roles.includes('inlet')) problems.push('The outline has no inlet edge (role "inlet", the manifold face): the flow has nowhere to enter.');
  if (!roles.includes('outlet')) problems.push('The outline has no outlet edge (role "outlet", the far end of the bore): the flow has nowhere to leave.');
  return problems;
}
