/** The section editor's public face: pure edits, picking, snapping, the drag tool and the shortcut table. */

export { applyEdit, EDITS, EDIT_LIST, isEditName } from './edits.ts';
export type { EditArgs, EditName, EditRequest, EditShortcut, EditSpec } from './edits.ts';
export { EditError } from './errors.ts';
export type { FilletRef, HandleKind, HandleRef, PartHandleRef, PointRef } from './refs.ts';
export { sameHandle } from './refs.ts';
export { hitTest } from './hit-test.ts';
export type { Hit, HitOptions } from './hit-test.ts';
export { handlePosition, listHandles } from './handles.ts';
export type { Handle } from './handles.ts';
export { cornerShape, filletHandlePosition, handleDistance, radiusFromHandleDrag } from './fillet-handle.ts';
export type { CornerShape } from './fillet-handle.ts';
export { DEFAULT_GRID_STEP, roundToStep, snapNeighbours, snapPoint } from './snap.ts';
export type { AxisSnap, SnapResult, SnapSettings } from './snap.ts';
export { IDLE, stepTool } from './drag-tool.ts';
export type { DragGrip, OutlineGrip, PartGrip } from './drag-edit.ts';
export type { DragAction, ToolAction, ToolContext, ToolEvent, ToolState, ToolStep } from './drag-tool.ts';
export { chordOf, findShortcut, POINTER_HINTS, SHORTCUTS } from './shortcuts.ts';
export type { CommandName, KeyPress, Shortcut, ShortcutRun } from './shortcuts.ts';
export { activeSection, activeVariant } from './section-access.ts';
export { generatedGeometry } from './generated.ts';
export type { GeneratedGeometry } from './generated.ts';
export { liftFromDrag, liftHandlePosition, MAX_LIFT_SHARE } from './part-handles.ts';
export { NEW_ARC_BULGE } from './edits-edges.ts';
