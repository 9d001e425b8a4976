/** Bench inputs a browser kept before files held them, moved once into the work the app starts on. */
import type { BenchInputs, PortDocument } from '../../document/types.ts';
import { activeVariant } from '../../editor/index.ts';

/**
 * Moves the inputs `takeKept` hands over (the panel's, once) into the active variant of `doc`, through `setBench`
 * (an undoable step; false when refused), if that variant has none. While it has inputs of its own the kept ones
 * are not taken, so a later start on work without them still gets them. Returns what to tell the porter, or null.
 */
export function adoptKeptBench(
  doc: PortDocument,
  takeKept: () => BenchInputs | null,
  setBench: (bench: BenchInputs) => boolean,
): string | null {
  if (activeVariant(doc).bench !== undefined) return null;
  const kept = takeKept();
  if (kept === null || !setBench(kept)) return null;
  return `The air and bench inputs kept in this browser are now saved with the variant "${doc.activeVariant}".`;
}
