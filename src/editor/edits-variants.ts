/** Edits of the document's variants: add a copy, rename, switch, delete. */

import { z } from 'zod';
import type { PortDocument, Variant } from '../document/types.ts';
import { EditError } from './errors.ts';
import { nameWithSuffix, typedName } from './names.ts';
import { activeVariantIndex, variantIndex } from './section-access.ts';

/** A trimmed name no other variant uses, or an EditError saying why not. */
function freshName(doc: PortDocument, name: string, edit: string): string {
  const trimmed = typedName(name, 'variant', edit);
  if (trimmed === '') throw new EditError(edit, 'A variant needs a name.');
  if (doc.variants.some((v) => v.name === trimmed)) throw new EditError(edit, `There is already a variant called "${trimmed}".`);
  return trimmed;
}

/** "<base> copy", then "<base> copy 2", "<base> copy 3"... whichever is free first (a long base is cut to fit the file). */
function copyName(doc: PortDocument, base: string): string {
  const taken = new Set(doc.variants.map((v) => v.name));
  for (let k = 1; ; k++) {
    const name = nameWithSuffix(base, k === 1 ? ' copy' : ` copy ${k}`);
    if (!taken.has(name)) return name;
  }
}

export const addVariantArgs = z.strictObject({ name: z.string().optional() });
export type AddVariantArgs = z.infer<typeof addVariantArgs>;

/**
 * Adds a copy of the active variant at the end, named `name` or "<active> copy", and makes it active
 * (the porter copies a variant to change it). The copy shares the section object: documents are immutable.
 */
export function addVariant(doc: PortDocument, { name }: AddVariantArgs): PortDocument {
  const edit = 'addVariant';
  const active = doc.variants[activeVariantIndex(doc, edit)];
  const newName = name === undefined ? copyName(doc, active.name) : freshName(doc, name, edit);
  const copy: Variant = { ...active, name: newName };
  return { ...doc, variants: [...doc.variants, copy], activeVariant: newName };
}

export const renameVariantArgs = z.strictObject({ from: z.string(), to: z.string() });
export type RenameVariantArgs = z.infer<typeof renameVariantArgs>;

/** Renames a variant; the active variant stays active under its new name. */
export function renameVariant(doc: PortDocument, { from, to }: RenameVariantArgs): PortDocument {
  const edit = 'renameVariant';
  const index = variantIndex(doc, from, edit);
  if (to.trim() === from) return doc;
  const newName = freshName(doc, to, edit);
  const variants = doc.variants.map((v, k) => (k === index ? { ...v, name: newName } : v));
  return { ...doc, variants, activeVariant: doc.activeVariant === from ? newName : doc.activeVariant };
}

export const setActiveVariantArgs = z.strictObject({ name: z.string() });
export type SetActiveVariantArgs = z.infer<typeof setActiveVariantArgs>;

/** Makes another variant the one shown, edited and solved. */
export function setActiveVariant(doc: PortDocument, { name }: SetActiveVariantArgs): PortDocument {
  variantIndex(doc, name, 'setActiveVariant');
  return doc.activeVariant === name ? doc : { ...doc, activeVariant: name };
}

export const deleteVariantArgs = z.strictObject({ name: z.string() });
export type DeleteVariantArgs = z.infer<typeof deleteVariantArgs>;

/** Deletes a variant (never the last one). Deleting the active one activates the one before it (or after, if first). */
export function deleteVariant(doc: PortDocument, { name }: DeleteVariantArgs): PortDocument {
  const edit = 'deleteVariant';
  const index = variantIndex(doc, name, edit);
  if (doc.variants.length === 1) throw new EditError(edit, `"${name}" is the only variant; a document keeps at least one.`);
  const variants = doc.variants.filter((_, k) => k !== index);
  const activeVariant = doc.activeVariant === name ? variants[Math.max(0, index - 1)].name : doc.activeVariant;
  return { ...doc, variants, activeVariant };
}
