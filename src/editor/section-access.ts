/** Reading and replacing the active variant's section and its outlines, sharing every untouched part. */

import type { Outline, PortDocument, Section, Variant } from '../document/types.ts';
import { EditError } from './errors.ts';

/** Index of the active variant; a document whose active name matches no variant cannot be edited. */
export function activeVariantIndex(doc: PortDocument, edit: string): number {
  const index = doc.variants.findIndex((v) => v.name === doc.activeVariant);
  if (index < 0) throw new EditError(edit, `The active variant "${doc.activeVariant}" is not in the document.`);
  return index;
}

/** Index of the variant named `name`; throws EditError when there is none. */
export function variantIndex(doc: PortDocument, name: string, edit: string): number {
  const index = doc.variants.findIndex((v) => v.name === name);
  if (index < 0) throw new EditError(edit, `There is no variant called "${name}".`);
  return index;
}

/** The variant an edit names, or the active one when it names none: its index and the variant itself. */
export function namedOrActiveVariant(doc: PortDocument, name: string | undefined, edit: string): { index: number; variant: Variant } {
  const index = name === undefined ? activeVariantIndex(doc, edit) : variantIndex(doc, name, edit);
  return { index, variant: doc.variants[index] };
}

/**
 * `doc` with the variant at `index` given `value` under its optional `key`, or without the key when `value` is
 * undefined (a file never holds an empty placeholder).
 */
export function withVariantKey<K extends 'bench' | 'width' | 'axisymmetric'>(doc: PortDocument, index: number, key: K, value: Variant[K]): PortDocument {
  const { section, ...others } = doc.variants[index];
  const rest: Partial<Variant> = { ...others };
  delete rest[key];
  // Just before the section, where the file writes it.
  const after = (value === undefined ? { ...rest, section } : { ...rest, [key]: value, section }) as Variant;
  return { ...doc, variants: doc.variants.map((v, k) => (k === index ? after : v)) };
}

/** The active variant (its section and its parts); throws EditError when the active name matches none. */
export function activeVariant(doc: PortDocument, edit = ''): Variant {
  return doc.variants[activeVariantIndex(doc, edit)];
}

export function activeSection(doc: PortDocument, edit = ''): Section {
  return activeVariant(doc, edit).section;
}

/** The document with the active variant's section replaced; the same document when nothing changed. */
export function withActiveSection(doc: PortDocument, edit: string, section: Section): PortDocument {
  const index = activeVariantIndex(doc, edit);
  const variant = doc.variants[index];
  if (variant.section === section) return doc;
  return { ...doc, variants: replaceAt(doc.variants, index, { ...variant, section }) };
}

/** The outer outline (island undefined) or island `island`'s outline; undefined when there is no such island. */
export function findOutline(section: Section, island: number | undefined): Outline | undefined {
  return island === undefined ? section.outline : section.islands[island]?.outline;
}

/** The outer outline (island undefined) or island `island`'s outline. */
export function outlineOf(section: Section, island: number | undefined, edit: string): Outline {
  if (island === undefined) return section.outline;
  const found = section.islands[island];
  if (found === undefined) {
    throw new EditError(edit, `There is no island ${island + 1}: the section has ${section.islands.length}.`);
  }
  return found.outline;
}

/** The section with one outline replaced; the same section when nothing changed. */
export function withOutline(section: Section, island: number | undefined, outline: Outline): Section {
  if (island === undefined) return section.outline === outline ? section : { ...section, outline };
  const old = section.islands[island];
  if (old.outline === outline) return section;
  return { ...section, islands: replaceAt(section.islands, island, { ...old, outline }) };
}

/** "the section outline" or `island "valve head"`, for messages. */
export function outlineName(section: Section, island: number | undefined): string {
  return island === undefined ? 'the section outline' : `island "${section.islands[island].name}"`;
}

/** A copy of `items` with item `index` replaced. */
export function replaceAt<T>(items: readonly T[], index: number, value: T): readonly T[] {
  const copy = items.slice();
  copy[index] = value;
  return copy;
}

/** Wraps an index onto a closed outline of `n` items. */
export function wrap(index: number, n: number): number {
  return ((index % n) + n) % n;
}
