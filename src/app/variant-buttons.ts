/** The variant list and its Copy, Rename and Delete buttons in the top bar; each change is one edit. */
import type { DocumentStore } from './document-store.ts';

type TryEdit = (name: string, args: unknown) => void;

export function wireVariantButtons(byId: (id: string) => HTMLElement, store: DocumentStore, tryEdit: TryEdit): void {
  const select = byId('variant-select') as HTMLSelectElement;
  select.addEventListener('change', () => tryEdit('setActiveVariant', { name: select.value }));
  byId('copy-variant').addEventListener('click', () => tryEdit('addVariant', {}));
  byId('rename-variant').addEventListener('click', () => {
    const to = prompt('New name for this variant', store.doc.activeVariant);
    if (to !== null) tryEdit('renameVariant', { from: store.doc.activeVariant, to: to.trim() });
  });
  byId('delete-variant').addEventListener('click', () => {
    if (confirm(`Delete the variant "${store.doc.activeVariant}"?`)) tryEdit('deleteVariant', { name: store.doc.activeVariant });
  });
}
