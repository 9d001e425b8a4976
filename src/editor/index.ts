/** The section editor's public face: pure edits, picking, snapping, the drag tool and the shortcut table. */

export { applyEdit, EDITS, EDIT_LIST, isEditName } from './edits.ts';
export type { EditArgs, EditName, EditRequest, EditShortcut, EditSpec } from './edits.ts';
export { EditError } from './errors.ts';
export type { FilletRef, HandleKind, HandleRef, PartHandleRef, PointRef } from './refs.ts';
export { isPartHandle, sameHandle } from './refs.ts';
export { hitTest, filletHandlePosition, radiusFromHandleDrag } from './hit-test.ts';
export type { Hit, HitOptions } from './hit-test.ts';
export { handlePosition, listHandles, HANDLE_ORDER } from './handles.ts';
export type { Handle } from './handles.ts';
export { cornerShape, handleDistance, radiusForHandleDistance } from './fillet-handle.ts';
export type { CornerShape } from './fillet-handle.ts';
export { DEFAULT_GRID_STEP, roundToStep, snapNeighbours, snapPoint } from './snap.ts';
export type { AxisSnap, SnapResult, SnapSettings } from './snap.ts';
export { DRAG_THRESHOLD_PX, IDLE, stepTool } from './drag-tool.ts';
export type { DragGrip, OutlineGrip, PartGrip } from './drag-edit.ts';
export type { DragAction, ToolAction, ToolContext, ToolEvent, ToolState, ToolStep } from './drag-tool.ts';
export { chordOf, findShortcut, POINTER_HINTS, SHORTCUTS } from './shortcuts.ts';
export type { CommandName, KeyPress, Shortcut, ShortcutRun } from './shortcuts.ts';
export { editForSelection } from './selection-edits.ts';
export type { SelectionEdit } from './selection-edits.ts';
export { activeSection, activeVariant } from './section-access.ts';
export { generatedGeometry, isGenerated } from './generated.ts';
export type { GeneratedGeometry } from './generated.ts';
export {
  axisFromDrag, axisHandlePosition, liftFromDrag, liftHandlePosition, MAX_LIFT_SHARE, partHandlePosition, partHandles,
} from './part-handles.ts';
export { NEW_ARC_BULGE } from './edits-edges.ts';
export { copyName } from './edits-variants.ts';
export { TYPED_NAME_MAX } from './names.ts';
