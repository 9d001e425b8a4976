/** The nearest valid value for a drag step the shape cannot take: a fillet radius held at the largest that fits. */
import type { PortDocument } from '../document/types.ts';
import { activeSection } from '../editor/index.ts';
import { formatLength, GeometryError } from '../geometry/index.ts';
import { DocumentCheckError } from './document-check.ts';

/** Arguments to try instead, and the reason to show. */
export interface ClampedEdit {
  readonly args: unknown;
  readonly note: string;
}

interface FilletArgs {
  readonly vertex: number;
  readonly island?: number;
  readonly radius: number;
}

/**
 * For a setFilletRadius refused because that very corner's fillet does not fit, the same edit at the largest radius
 * that fits (`shrink` below 1 takes a hair less, for a second try); null for any other edit or problem, which has
 * no nearest valid value and is refused.
 */
export function clampEdit(doc: PortDocument, name: string, args: unknown, error: unknown, shrink = 1): ClampedEdit | null {
  if (name !== 'setFilletRadius' || !(error instanceof DocumentCheckError)) return null;
  const fault = error.fault;
  if (!(fault instanceof GeometryError) || fault.code !== 'fillet-too-large' || fault.largestRadius === undefined) return null;
  const asked = args as FilletArgs;
  const islandName = asked.island === undefined ? undefined : activeSection(doc).islands[asked.island]?.name;
  if (fault.vertexIndex !== asked.vertex || fault.islandName !== islandName) return null;
  const radius = Math.max(0, fault.largestRadius * shrink);
  if (!(radius < asked.radius)) return null;
  const note = `The fillet at corner ${asked.vertex + 1} is held at ${formatLength(radius, doc.units, 'down')}, ` +
    `the largest that fits between its neighbouring edges (${formatLength(asked.radius, doc.units)} does not fit).`;
  return { args: { ...asked, radius }, note };
}
