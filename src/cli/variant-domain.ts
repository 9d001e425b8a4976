/** A variant's flow domain as `solve` solves it and `check` judges it: the study's own case set-up on the file's grid. */

import type { PortDocument, Variant } from '../document/types.ts';
import { caseSetup, CELLS_BY_DETAIL } from '../study/index.ts';
import type { FlowDomain } from '../solver/types.ts';

/** Target cells of the file's own grid detail: what the app solves it on. */
export function fileCells(document: PortDocument): number {
  return CELLS_BY_DETAIL[document.settings.gridDetail];
}

/** Throws GeometryError or PartsError (both the porter's to fix); anything else is a fault. */
export function variantDomain(variant: Variant, document: PortDocument): FlowDomain {
  return caseSetup(document, { variant: variant.name, targetCells: fileCells(document) }).domain;
}
