/** Parametric parts: the valve head, seat rings and test bore generated into the section, their notes and breathing numbers. */

export { applyParts, sectionForSolver } from './apply.ts';
export { PartsError, type PartsErrorCode } from './errors.ts';
export { valveFrame, toSection, fromSection, type ValveFrame } from './frame.ts';
export { VALVE_ISLAND_NAME, valveIsland, valveHalfProfile, type ValveHalfProfile } from './valve-head.ts';
export { seatRing, throatDiameter, deckLevel, type SeatRing } from './seat.ts';
export { boreBox, manifoldSide, type BoreBox } from './bore.ts';
export { deckLine, type DeckLine } from './deck.ts';
export { anchorIndices, pocketAnchors, type PocketAnchors } from './anchors.ts';
export { partsNotes, SHROUD_CLEARANCE_SHARE, type PartsNote, type PartsNoteOptions } from './notes.ts';
export {
  partsBreathing, portAreaUsed, MEASURED_PORT_NAME, ROUND_PORT_NAME, SOLVED_PORT_NAME,
  type BreathingOptions, type PartsBreathing, type PortAreaUsed, type PortAreaSource,
} from './breathing.ts';
export { breathingSummary, type BreathingSummary } from './summary.ts';
export { metresPerUnit, seatCutSI, valveHeadSI } from './si.ts';
