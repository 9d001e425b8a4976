/** The one registry of edits (name, label, keys, argument schema, pure function) and applyEdit, the one way in. */

import type { z } from 'zod';
import type { PortDocument } from '../document/types.ts';
import { parseArgs } from './args.ts';
import { EditError } from './errors.ts';
import {
  makeArc, makeArcArgs, makeCurve, makeCurveArgs, makeLine, makeLineArgs,
  setEdgeRole, setEdgeRoleArgs, setWallName, setWallNameArgs,
} from './edits-edges.ts';
import {
  deleteVertex, deleteVertexArgs, insertVertex, insertVertexArgs, movePoint, movePointArgs,
  setFilletRadius, setFilletRadiusArgs,
} from './edits-points.ts';
import {
  regenerateParts, removeParts, removePartsArgs, setLift, setLiftArgs, setPart, setPartArgs, setParts, setPartsArgs,
} from './edits-parts.ts';
import {
  addVariant, addVariantArgs, deleteVariant, deleteVariantArgs, renameVariant, renameVariantArgs,
  setActiveVariant, setActiveVariantArgs,
} from './edits-variants.ts';
import { setUnits, setUnitsArgs } from './edits-units.ts';
import { setBench, setBenchArgs } from './edits-bench.ts';
import { setWidthProfile, setWidthProfileArgs } from './edits-width.ts';
import { setAxisymmetric, setAxisymmetricArgs } from './edits-axisymmetric.ts';

/** A key that runs an edit on the current selection. */
export interface EditShortcut {
  /** Key as matched and shown, e.g. "a", "Delete" (see shortcuts.ts for the chord format). */
  readonly key: string;
  /** One line for the help overlay. */
  readonly description: string;
  /** What the selection must be: a corner, or an edge (a selected through or via point stands for its edge). */
  readonly target: 'vertex' | 'edge';
  /** Arguments the key fixes, e.g. `{ role: 'inlet' }`. */
  readonly preset?: Readonly<Record<string, unknown>>;
}

export interface EditSpec<A> {
  readonly name: string;
  /** Short label for menus and the undo list, e.g. "Insert corner". */
  readonly label: string;
  readonly shortcuts?: readonly EditShortcut[];
  /** Checks the arguments' form; the function itself checks them against the document. */
  readonly args: z.ZodType<A>;
  /** Pure: returns a new document sharing untouched parts, or `doc` itself when nothing changes. */
  readonly run: (doc: PortDocument, args: A) => PortDocument;
  /**
   * True for the parts edits: `run` leaves nothing to regenerate (setPart, setParts and setLift regenerate the variant
   * they change themselves, to check the result; removeParts drops the parts), so applyEdit skips regenerateParts,
   * which would build the same geometry a second time on each step of a lift or valve drag.
   */
  readonly regeneratesParts?: true;
}

const spec = <A>(s: EditSpec<A>): EditSpec<A> => s;

export const EDITS = {
  movePoint: spec({ name: 'movePoint', label: 'Move point', args: movePointArgs, run: movePoint }),
  insertVertex: spec({ name: 'insertVertex', label: 'Insert corner', args: insertVertexArgs, run: insertVertex }),
  deleteVertex: spec({
    name: 'deleteVertex', label: 'Delete corner', args: deleteVertexArgs, run: deleteVertex,
    shortcuts: [
      { key: 'Delete', description: 'Delete the selected corner', target: 'vertex' },
      { key: 'Backspace', description: 'Delete the selected corner', target: 'vertex' },
    ],
  }),
  setFilletRadius: spec({ name: 'setFilletRadius', label: 'Set fillet radius', args: setFilletRadiusArgs, run: setFilletRadius }),
  setEdgeRole: spec({
    name: 'setEdgeRole', label: 'Mark edge', args: setEdgeRoleArgs, run: setEdgeRole,
    shortcuts: [
      { key: 'w', description: 'Mark the selected edge as a wall', target: 'edge', preset: { role: 'wall' } },
      { key: 'n', description: 'Mark the selected edge as the inlet', target: 'edge', preset: { role: 'inlet' } },
      { key: 'o', description: 'Mark the selected edge as the outlet', target: 'edge', preset: { role: 'outlet' } },
    ],
  }),
  setWallName: spec({ name: 'setWallName', label: 'Name wall', args: setWallNameArgs, run: setWallName }),
  makeArc: spec({
    name: 'makeArc', label: 'Make arc', args: makeArcArgs, run: makeArc,
    shortcuts: [{ key: 'a', description: 'Make the selected edge an arc', target: 'edge' }],
  }),
  makeCurve: spec({
    name: 'makeCurve', label: 'Make curve', args: makeCurveArgs, run: makeCurve,
    shortcuts: [{ key: 'c', description: 'Make the selected edge a smooth curve', target: 'edge' }],
  }),
  makeLine: spec({
    name: 'makeLine', label: 'Make straight', args: makeLineArgs, run: makeLine,
    shortcuts: [{ key: 'l', description: 'Make the selected edge straight', target: 'edge' }],
  }),
  addVariant: spec({ name: 'addVariant', label: 'Copy variant', args: addVariantArgs, run: addVariant }),
  renameVariant: spec({ name: 'renameVariant', label: 'Rename variant', args: renameVariantArgs, run: renameVariant }),
  setActiveVariant: spec({ name: 'setActiveVariant', label: 'Switch variant', args: setActiveVariantArgs, run: setActiveVariant }),
  deleteVariant: spec({ name: 'deleteVariant', label: 'Delete variant', args: deleteVariantArgs, run: deleteVariant }),
  setUnits: spec({ name: 'setUnits', label: 'Change units', args: setUnitsArgs, run: setUnits }),
  setPart: spec({ name: 'setPart', label: 'Change part', args: setPartArgs, run: setPart, regeneratesParts: true }),
  setParts: spec({ name: 'setParts', label: 'Set parts', args: setPartsArgs, run: setParts, regeneratesParts: true }),
  setLift: spec({ name: 'setLift', label: 'Set lift', args: setLiftArgs, run: setLift, regeneratesParts: true }),
  removeParts: spec({ name: 'removeParts', label: 'Remove parts', args: removePartsArgs, run: removeParts, regeneratesParts: true }),
  setBench: spec({ name: 'setBench', label: 'Set bench inputs', args: setBenchArgs, run: setBench }),
  setWidthProfile: spec({ name: 'setWidthProfile', label: 'Set width profile', args: setWidthProfileArgs, run: setWidthProfile }),
  setAxisymmetric: spec({ name: 'setAxisymmetric', label: 'Set round (axisymmetric) model', args: setAxisymmetricArgs, run: setAxisymmetric }),
} as const;

export type EditName = keyof typeof EDITS;

/** The arguments of edit `N`, e.g. `EditArgs<'movePoint'>` is `{ point: PointRef; to: Point }`. */
export type EditArgs<N extends EditName> = Parameters<(typeof EDITS)[N]['run']>[1];

/** A named edit with its arguments, as tools and shortcuts emit them. */
export type EditRequest = { [N in EditName]: { readonly name: N; readonly args: EditArgs<N> } }[EditName];

/** Every edit in registry order, for menus and the help overlay. */
export const EDIT_LIST: readonly EditSpec<unknown>[] = Object.values(EDITS) as readonly EditSpec<unknown>[];

export function isEditName(name: string): name is EditName {
  return Object.hasOwn(EDITS, name);
}

/**
 * Applies edit `name` to `doc`: checks `args` (form, then against the document) and runs the pure edit, then
 * regenerates the parametric parts of any section it changed (so generated geometry always matches its numbers).
 * Throws EditError with a plain message for an unknown edit or bad arguments; `doc` is never changed.
 * Returns `doc` itself when the edit changes nothing (so no undo step is needed).
 */
export function applyEdit(doc: PortDocument, name: string, args: unknown): PortDocument {
  if (!isEditName(name)) throw new EditError('', `There is no edit called "${name}".`);
  const edit = EDITS[name] as EditSpec<unknown>;
  const after = edit.run(doc, parseArgs(edit.args, name, args));
  return edit.regeneratesParts ? after : regenerateParts(doc, after, name);
}
