/** Wires pointer and keyboard events to the pure drag tool and sends its edits to the document store. */
import { lengthLabel } from '../breathing/units.ts';
import type { PortDocument, Point } from '../document/types.ts';
import {
  activeSection, activeVariant, DEFAULT_GRID_STEP, findShortcut, hitTest, IDLE, listHandles, sameHandle, stepTool,
  type CommandName, type HandleRef, type ToolAction, type ToolEvent, type ToolState,
} from '../editor/index.ts';
import type { FlowView } from '../view/flow-view.ts';
import { HandleOverlay, type HandleMark } from '../view/handle-overlay.ts';
import type { DocumentStore } from './document-store.ts';
import { plainMessage } from './document-check.ts';
import { newestOnly } from './newest-only.ts';
import { isTextBox, TypedBoxes } from './typed-boxes.ts';

/** Pick slop around a handle, CSS pixels. */
const PICK_PX = 9;

export interface EditorHooks {
  readonly onCommand: (name: CommandName) => void;
  readonly onMessage: (message: string, level: 'info' | 'error') => void;
  readonly snapping: () => boolean;
  /** The selection may have changed (after every event the tool handles). */
  readonly onSelection?: (selection: HandleRef | null) => void;
}

export class EditorController {
  private state: ToolState = IDLE;
  /** Text boxes typed in since their last commit: they keep the browser's own undo. */
  private readonly boxes = new TypedBoxes();
  private readonly overlay: HandleOverlay;
  /** Whether the tool did something with the last event (then a key press is not passed on to the page). */
  private lastHandled = false;
  /** The pointer whose press the tool follows now, from its pointerdown to its pointerup or pointercancel. */
  private pressedBy: number | null = null;
  insertMode = false;

  constructor(
    private readonly host: HTMLElement,
    private readonly view: FlowView,
    private readonly store: DocumentStore,
    private readonly hooks: EditorHooks,
  ) {
    this.overlay = new HandleOverlay(host);
    view.onViewChange((t) => this.overlay.setTransform(t));
    this.overlay.setTransform(view.transform);
    view.claimPointer = (ev, x, y) => this.claim(ev, [x, y]);
    window.addEventListener('keydown', this.onKey);
    store.subscribe(() => this.drawHandles());
    this.drawHandles();
  }

  /** Forget the selection (a file was opened or the variant changed: indices no longer mean the same thing). */
  reset(): void {
    this.state = IDLE;
    this.drawHandles();
    this.hooks.onSelection?.(null);
  }

  get selection(): HandleRef | null {
    return this.state.selection;
  }

  /** Claim a press on a handle or an edge so the view does not pan; a press on empty space pans and clears the selection. */
  private claim(ev: PointerEvent, at: Point): boolean {
    // A second finger or pen while one is pressed is left alone: it neither takes over nor cancels the drag, nor pans.
    if (this.pressedBy !== null && this.pressedBy !== ev.pointerId) return true;
    const insert = this.insertMode || ev.shiftKey;
    const hit = hitTest(activeSection(this.store.doc), at, this.tolerance(), { parts: activeVariant(this.store.doc).parts });
    if (!hit) {
      if (this.state.selection) this.dispatch({ type: 'key', press: { key: 'Escape' } });
      return false;
    }
    this.dispatch({ type: 'pointer-down', at, screen: [ev.clientX, ev.clientY], insert });
    this.pressedBy = ev.pointerId;
    // Where the view lies on the page, read once: read on every move it would force a layout of the handles just
    // redrawn before the edit could start.
    const host = this.host.getBoundingClientRect();
    const sectionPoint = (e: PointerEvent): Point => {
      const p = this.view.screenToSection(e.clientX - host.left, e.clientY - host.top);
      return [p.x, p.y];
    };
    // Only this pointer: a second finger or pen does not move the point.
    const ours = (e: PointerEvent) => e.pointerId === ev.pointerId;
    const move = (e: PointerEvent) => {
      if (ours(e)) this.dispatch({ type: 'pointer-move', at: sectionPoint(e), screen: [e.clientX, e.clientY] });
    };
    // Chromium sends each movement at once as pointerrawupdate; pointermove waits for the next frame, which on a
    // busy or software-drawn page is tens of ms later. Acting on the raw update starts the solve that much sooner.
    // The later pointermove at the same place is no new edit (the tool drops it).
    const raw = newestOnly((e: Event) => move(e as PointerEvent));
    const listeners: Array<[string, (e: Event) => void]> = [
      ['pointerrawupdate', raw.handle],
      ['pointermove', (e) => move(e as PointerEvent)],
      ['pointerup', (e) => end(e as PointerEvent, 'pointer-up')],
      // The browser took the pointer (e.g. a touch became a scroll): the drag is undone, as with Escape.
      ['pointercancel', (e) => end(e as PointerEvent, 'pointer-cancel')],
    ];
    const end = (e: PointerEvent, type: 'pointer-up' | 'pointer-cancel') => {
      if (!ours(e)) return;
      this.pressedBy = null;
      raw.cancel();
      for (const [name, listener] of listeners) window.removeEventListener(name, listener);
      if (type === 'pointer-up') this.dispatch({ type, at: sectionPoint(e), screen: [e.clientX, e.clientY] });
      else this.dispatch({ type });
    };
    for (const [name, listener] of listeners) window.addEventListener(name, listener);
    // Captured, the pointer's events go straight to the view: the browser need not find what lies under the pointer
    // (and bring the layout up to date first) on every move. Released on pointerup by the browser.
    try {
      this.host.setPointerCapture(ev.pointerId);
    } catch {
      // Not an active pointer (a synthetic event): without capture the drag still works, only slower.
    }
    return true;
  }

  private readonly onKey = (ev: KeyboardEvent): void => {
    const target = ev.target as HTMLElement | null;
    if (target && isTextBox(target)) {
      // A box being typed in keeps the browser's own undo; once committed, undo and redo are the document's.
      if (this.boxes.typing(target) || !isHistoryKey(ev)) return;
      target.blur();
    }
    const before = this.state;
    this.dispatch({ type: 'key', press: { key: ev.key, ctrlKey: ev.ctrlKey, metaKey: ev.metaKey, altKey: ev.altKey, shiftKey: ev.shiftKey } });
    if (this.state !== before || this.lastHandled) ev.preventDefault();
  };

  private dispatch(event: ToolEvent): void {
    const step = stepTool(this.state, event, this.context());
    const docBefore = this.store.doc;
    this.state = step.state;
    this.lastHandled = step.actions.length > 0;
    for (const action of step.actions) this.perform(action);
    // An edit has drawn them already (store subscription); a selection alone has not.
    if (this.store.doc === docBefore) this.drawHandles();
    this.hooks.onSelection?.(this.state.selection);
  }

  private perform(action: ToolAction): void {
    switch (action.type) {
      case 'select': return;
      case 'drag-start':
      case 'drag-move': return this.tryEdit(action.edit.name, action.edit.args, 'drag');
      case 'drag-end':
        this.tryEdit(action.edit.name, action.edit.args, 'drag');
        return this.store.endDrag();
      case 'drag-cancel': return this.store.cancelDrag();
      case 'edit': return this.tryEdit(action.edit.name, action.edit.args, 'edit');
      case 'command':
        if (action.name === 'toggleInsertMode') {
          this.insertMode = !this.insertMode;
          return this.hooks.onMessage(this.insertMode ? 'Insert mode: click an edge to add a corner there.' : 'Insert mode off.', 'info');
        }
        return this.hooks.onCommand(action.name);
      case 'hint': return this.hooks.onMessage(action.message, 'info');
    }
  }

  /**
   * An edit that fails (e.g. a corner dropped on its neighbour, a fillet that no longer fits) leaves the document as
   * it was and says why; a drag step held at its nearest valid value says so too.
   */
  private tryEdit(name: string, args: unknown, cause: 'drag' | 'edit'): void {
    try {
      const note = this.store.edit(name, args, cause);
      if (note !== undefined) this.hooks.onMessage(note, 'info');
    } catch (error) {
      // A refused drag step is the porter's cue, not a fault: it stays in the status line after the full solve.
      this.hooks.onMessage(plainMessage(error), cause === 'drag' ? 'info' : 'error');
    }
  }

  /** After an undo or redo: keep the selection while it still names something in the active variant. */
  keepValidSelection(variantChanged: boolean): void {
    const selection = this.state.selection;
    if (selection === null) return;
    if (variantChanged || !selectionExists(this.store.doc, selection)) this.reset();
  }

  private context() {
    const units = this.store.doc.units;
    const snap = this.hooks.snapping() ? { gridStep: DEFAULT_GRID_STEP[units], alignTolerance: 4 / this.view.transform.scale } : null;
    return { section: activeSection(this.store.doc), parts: activeVariant(this.store.doc).parts, tolerance: this.tolerance(), snap };
  }

  private tolerance(): number {
    return PICK_PX / this.view.transform.scale;
  }

  private drawHandles(): void {
    const section = activeSection(this.store.doc);
    const parts = activeVariant(this.store.doc).parts;
    const selected = this.state.selection;
    const marks: HandleMark[] = listHandles(section, parts).map(({ ref, at }) => ({
      x: at[0], y: at[1],
      style: STYLE_BY_KIND[ref.kind] ?? 'point',
      selected: sameHandle(selected, ref),
      label: sameHandle(selected, ref) || ref.kind === 'lift' ? this.handleLabel(ref) : undefined,
    }));
    this.overlay.setHandles(marks);
  }

  /** What a handle sets, shown beside it: a fillet's radius, the lift, the valve axis. */
  private handleLabel(ref: HandleRef): string | undefined {
    const { units } = this.store.doc;
    const digits = units === 'mm' ? 1 : 3;
    const section = activeSection(this.store.doc);
    if (ref.kind === 'fillet') return `R ${filletRadiusOf(section, ref).toFixed(digits)} ${lengthLabel(units)}`;
    const valve = activeVariant(this.store.doc).parts?.valve;
    if (ref.kind === 'lift' && valve) return `lift ${valve.lift.toFixed(digits)} ${lengthLabel(units)}`;
    if (ref.kind === 'valve-axis') return 'valve axis';
    return undefined;
  }

  dispose(): void {
    window.removeEventListener('keydown', this.onKey);
    this.boxes.dispose();
    this.overlay.dispose();
  }
}

function isHistoryKey(ev: KeyboardEvent): boolean {
  const run = findShortcut(ev)?.run;
  return run !== undefined && 'command' in run && (run.command === 'undo' || run.command === 'redo');
}

/** Whether `ref` still names an edge or a handle of the document's active variant. */
function selectionExists(doc: PortDocument, ref: HandleRef): boolean {
  const section = activeSection(doc);
  if (ref.kind === 'edge') {
    const outline = ref.island === undefined ? section.outline : section.islands[ref.island]?.outline;
    return outline?.edges[ref.edge] !== undefined;
  }
  return listHandles(section, activeVariant(doc).parts).some((h) => sameHandle(h.ref, ref));
}

const STYLE_BY_KIND: Partial<Record<HandleRef['kind'], HandleMark['style']>> = {
  vertex: 'corner', fillet: 'fillet', lift: 'part', 'valve-axis': 'part',
};

function filletRadiusOf(section: ReturnType<typeof activeSection>, ref: Extract<HandleRef, { kind: 'fillet' }>): number {
  const outline = ref.island === undefined ? section.outline : section.islands[ref.island].outline;
  return outline.vertices[ref.vertex]?.filletRadius ?? 0;
}
