/** Portwright in the browser: the one file that wires document, editor, workers and view together. */
import './app/zod-jitless.ts'; // first: zod must be jitless before any schema is built (the CSP refuses eval)
import sampleText from '../samples/short-side-compare.json?raw';
import { acceptDrops, downloadDocument, pickFile, type FileHandlers } from './app/files.ts';
import { openKeptStorage } from './app/keeping/storage.ts';
import { mountWorkKeeping } from './app/keeping/work-keeping.ts';
import type { ChangeCause } from './app/document-store.ts';
import { plainMessage } from './app/document-check.ts';
import { mountHistoryControls } from './app/history-controls.ts';
import { Overlays } from './app/overlays.ts';
import { readLegacyWork, startStore } from './app/keeping/start-document.ts';
import { wireVariantButtons } from './app/variant-buttons.ts';
import { EditorController } from './app/editor-controller.ts';
import { FlowPicture } from './app/flow-picture.ts';
import { caseSetup, CELLS_BY_DETAIL, DRAG_CELLS, type CaseSetup } from './study/index.ts';
import { fillHelp } from './app/help-overlay.ts';
import { LiveSolve } from './app/live-solve.ts';
import { mountBenchPanel } from './app/bench-panel/panel.ts';
import { adoptKeptBench } from './app/bench-panel/adopt.ts';
import { showPartsNumbers } from './app/breathing-panel.ts';
import { PartsPanel } from './app/parts-panel.ts';
import { PlotsPanel } from './app/plots-panel.ts';
import { mountWidthEditing } from './app/width/editing.ts';
import { SelectionPanel } from './app/selection-panel.ts';
import { SolveIndicator } from './app/solve-indicator.ts';
import { ReadingsPanel } from './app/readings-panel.ts';
import { defaultSettings, parseLevels } from './app/settings.ts';
import { buildSettingsPanel, type SettingsGroup } from './app/settings-panel.ts';
import { sentences, StatusLine } from './app/status.ts';
import type { PortDocument } from './document/types.ts';
import { activeSection, activeVariant, type CommandName } from './editor/index.ts';
import { benchOnlyChange } from './editor/edits-bench.ts';
import { sectionBounds } from './geometry/index.ts';
import { thinWallNote } from './solver/thin-wall-note.ts';
import type { FlowDomain } from './solver/types.ts';
import { FlowView } from './view/flow-view.ts';
import { SolverPool } from './workers/pool.ts';
import { browserWorker } from './workers/worker-handle.ts';
import type { FieldReply } from './workers/protocol.ts';

const byId = <T extends HTMLElement>(id: string) => document.getElementById(id) as T;
const viewHost = byId<HTMLElement>('view-host');
const status = new StatusLine(byId('status'));
const indicator = new SolveIndicator(byId('solve-indicator'));
const helpOverlay = byId<HTMLElement>('help-overlay');
const variantSelect = byId<HTMLSelectElement>('variant-select');

const settings = defaultSettings();
// The last visit's work is read before anything is drawn, so it (not the sample) is what shows until the user chooses.
const started = await startStore(sampleText, openKeptStorage(), readLegacyWork(), Date.now());
const { store } = started;
settings.units = store.doc.units;
settings.gridDetail = store.doc.settings.gridDetail;

const view = new FlowView(viewHost, { units: store.doc.units, contourLevels: parseLevels(settings.contourLevels) });
/** The newest solver worker started (the live one; a replacement when one has failed). */
let newestWorker: Worker | null = null;
const pool = new SolverPool(() => {
  newestWorker = new Worker(new URL('./workers/solver.worker.ts', import.meta.url), { type: 'module' });
  return browserWorker(newestWorker);
});
const readings = new ReadingsPanel(byId('readings'), {
  onFinding: (f) => view.fitToView({ minX: f.x - f.radius, minY: f.y - f.radius, maxX: f.x + f.radius, maxY: f.y + f.radius }),
});
const plots = new PlotsPanel(byId('plots'));
// The width table and the plan-view strip under the section: their own edits, drags and store listener.
const widthEditing = mountWidthEditing({ panel: byId('width'), strip: byId('width-strip-host') }, store, (m, level) => status.show(m, level));
const picture = new FlowPicture(view, settings, () => store.doc.units);
let lastReply: FieldReply | null = null;
/** Least area ahead of the valve of the last full solve under a width profile (document units squared): the port area ranked. */
let solvedLeastArea: number | undefined;
let editTime = 0;
/** True from the first drag step until the next edit of another kind (the release). */
let dragging = false;
/** Times from an edit to the repainted field, ms (read by the browser benchmark). */
const timings: Array<{ kind: string; ms: number; cells: number }> = [];

const live = new LiveSolve(pool.live, {
  onStart: (kind, cells) => indicator.started(kind, cells),
  onField: (reply, kind, ms, domain) => {
    lastReply = reply;
    picture.solved(reply, kind, domain);
    timings.push({ kind, ms: performance.now() - editTime, cells: reply.nx * reply.ny });
    if (kind === 'full') {
      readings.show(reply, store.doc.units, ms);
      if (reply.reading) plots.show(reply.reading, store.doc.units);
      if (reply.reading) widthEditing.solved(reply.reading.stations);
      showSolvedPortArea(reply);
      readings.clearStale();
      status.clearErrors();
      showThinWalls(reply);
    }
    indicator.solved(kind, reply.nx * reply.ny, ms, live.busy);
  },
  onFailure: (failure, kind, domain) => {
    picture.failed(failure, kind, domain);
    indicator.show('error', 'not solved');
    status.show(failure.message, 'error');
    readings.showStale('This reading belongs to the last shape that solved.');
  },
  onWorkerNote: (message, level) => status.show(message, level),
});

/** Under a width profile the least area just solved is the port area the breathing ranking uses: show it when it changes. */
function showSolvedPortArea(reply: FieldReply): void {
  const area = reply.reading?.model === 'width' ? reply.reading.tightest?.area : undefined;
  if (area === solvedLeastArea) return;
  solvedLeastArea = area;
  showPartsNumbers(byId('breathing'), bench, store.doc, solvedLeastArea);
}

/** A wall thinner than a cell is solved as a wall one cell thick: say so after each full solve (previews may not resolve what the full grid does). */
function showThinWalls(reply: FieldReply): void {
  if (reply.thinWalls.length === 0) return;
  const choices = Object.entries(CELLS_BY_DETAIL).map(([label, cells]) => ({ label, cells }));
  status.show(sentences(...reply.thinWalls.map((wall) => thinWallNote(wall, { units: store.doc.units, spacing: reply.h, choices }))), 'warn');
}

/** The case the study pipeline sets up for this grid (the command's `solve` sets up the same one). */
function currentCase(doc: PortDocument, cells: number): CaseSetup | null {
  try {
    return caseSetup(doc, { targetCells: cells });
  } catch (error) {
    status.show(error instanceof Error ? error.message : String(error), 'error');
    readings.showStale('This reading belongs to the last shape that solved.');
    return null;
  }
}

function solve(doc: PortDocument, cause: ChangeCause): void {
  editTime = performance.now();
  const cells = cause === 'drag' ? DRAG_CELLS : CELLS_BY_DETAIL[settings.gridDetail];
  const setup = currentCase(doc, cells);
  if (!setup) {
    // Let go on a shape that cannot be solved (e.g. the valve shut on its seat): the drag's drawing still ends.
    if (cause !== 'drag') dragging = false;
    view.setInteractive(dragging);
    return;
  }
  if (cause === 'drag' && !dragging) picture.dragStarted();
  dragging = cause === 'drag';
  view.setInteractive(dragging);
  // Mid-drag the outline is drawn with the field solved for it (onField), not over the last one.
  const { domain } = setup;
  if (!dragging) picture.outline(domain);
  const reading = { ...setup.reading, slowFraction: settings.slowFraction, inletMeanSpeedMs: settings.inletSpeedMs };
  if (cause === 'drag') void live.request(domain, 'drag', cells, null);
  else void live.request(domain, 'full', cells, reading);
}

function showDocument(doc: PortDocument): void {
  byId('doc-title').textContent = doc.title;
  variantSelect.replaceChildren(...doc.variants.map((v) => new Option(v.name, v.name, false, v.name === doc.activeVariant)));
}

/** The active variant shown before the latest change (an undo that switches variants forgets the selection). */
let shownVariant = store.doc.activeVariant;
/** The document as the last change left it: a change of bench inputs alone has nothing to solve. */
let lastDoc = store.doc;
store.subscribe((doc, cause) => {
  const benchOnly = benchOnlyChange(lastDoc, doc);
  lastDoc = doc;
  // An opened file brings its own units and grid detail, and is solved on its own grid as the command solves it;
  // an undo or redo may bring back other units or another grid detail.
  const unitsChanged = settings.units !== doc.units || settings.gridDetail !== doc.settings.gridDetail;
  if (cause === 'open' || (cause === 'history' && unitsChanged)) {
    settings.units = doc.units;
    settings.gridDetail = doc.settings.gridDetail;
  }
  if (!benchOnly) solvedLeastArea = undefined; // until the new shape is solved
  if (!benchOnly) solve(doc, cause);
  // Mid-drag only the field and the handles follow the pointer; panels catch up when the drag ends.
  if (cause === 'drag') return;
  undoControls.refresh();
  if (cause === 'history') editor.keepValidSelection(doc.activeVariant !== shownVariant);
  shownVariant = doc.activeVariant;
  showDocument(doc);
  selectionPanel.show(doc, editor.selection);
  partsPanel.update(doc);
  showPartsNumbers(byId('breathing'), bench, doc, solvedLeastArea);
  bench.showInputs(activeVariant(doc).bench, doc.activeVariant);
  if (cause === 'history' && unitsChanged) {
    refreshSettingsPanel();
    view.setUnits(doc.units);
    view.fitToView(sectionBounds(activeSection(doc)));
  }
  if (cause === 'open') {
    editor.reset();
    // The settings panel shows the opened file's units and grid detail (it said the old ones before).
    refreshSettingsPanel();
    view.setUnits(doc.units);
    view.fitToView(sectionBounds(activeSection(doc)));
  }
});

const fileHandlers: FileHandlers = {
  // A file with a variant that does not build is refused (the store throws, files.ts reports it by variant).
  onOpened: (doc, name) => {
    const words = { label: `Open "${name}"`, doing: `opening "${name}"`, opened: `Opened "${name}".` };
    keeping.open(doc, words, (error) => fileHandlers.onRejected(`"${name}" was not opened: ${error instanceof Error ? error.message : String(error)}`, name));
  },
  onRejected: (message) => status.show(sentences(message, 'Your current work is unchanged.'), 'error'),
};

function runCommand(name: CommandName): void {
  switch (name) {
    case 'fitView': return view.fitToView(sectionBounds(activeSection(store.doc)));
    case 'toggleSnapping':
      settings.snapping = !settings.snapping;
      refreshSettingsPanel();
      return status.show(settings.snapping ? 'Snapping on.' : 'Snapping off.');
    case 'toggleHelp': helpOverlay.hidden = !helpOverlay.hidden; return;
    case 'save':
      status.show(`Saved as ${downloadDocument(store.doc)}.`);
      return keeping.saved();
    case 'open': return pickFile(byId('file-input'), fileHandlers);
    case 'cancel': overlays.closeAll(); return;
    case 'toggleInsertMode': return;
    case 'undo': return undoControls.undo();
    case 'redo': return undoControls.redo();
  }
}

const undoControls = mountHistoryControls(byId('undo-button'), byId('redo-button'), store, (message) => status.show(message));
const selectionPanel = new SelectionPanel(byId('selection'), (name, args) => tryEdit(name, args, false));
const editor = new EditorController(viewHost, view, store, {
  onCommand: runCommand,
  onMessage: (message, level) => status.show(message, level),
  snapping: () => settings.snapping,
  onSelection: (selection) => selectionPanel.show(store.doc, selection),
});

/** Each group touches only what it changes: a layer toggle or snapping neither re-scales nor re-traces the field. */
function applySettings(group: SettingsGroup): void {
  if (group === 'draw') {
    view.setLayers(settings.layers);
    view.setContourLevels(parseLevels(settings.contourLevels));
    try {
      view.setColourRange({ mode: settings.colourMode, min: settings.colourMin, max: settings.colourMax });
    } catch (error) {
      // A fixed range whose top is not above its bottom: said in plain words; the colours keep their last range.
      status.show(sentences(error instanceof Error ? error.message : String(error), 'The colours keep their last range.'), 'error');
    }
  }
  if (group === 'reference' && lastReply) picture.field(lastReply);
  if (group === 'solve' || group === 'reading') solve(store.doc, 'edit');
  if (group === 'units' && settings.units !== store.doc.units) {
    const units = settings.units;
    // Refused (the converted drawing would not build): the setting goes back to the drawing's units.
    settings.units = store.doc.units;
    if (tryEdit('setUnits', { units }, false, 'open')) status.show(`The drawing is now in ${units === 'mm' ? 'millimetres' : 'inches'}.`);
    else refreshSettingsPanel();
  }
}
const gui = buildSettingsPanel(byId('settings-host'), settings, applySettings);
/** The settings object changed from outside the panel (a key, the bench): show its values again. */
const refreshSettingsPanel = () => gui.controllersRecursive().forEach((c) => c.updateDisplay());
const bench = mountBenchPanel(byId('bench-host'), {
  units: { length: store.doc.units },
  onInletSpeed: (ms) => {
    settings.inletSpeedMs = ms;
    refreshSettingsPanel();
    applySettings('reading');
    status.show(`Flow scale for the boundary-layer march set to ${ms.toFixed(1)} m/s from the bench.`);
  },
  // One typed value or choice is one undo step; it is kept in the variant shown and solves nothing again.
  onInputs: (inputs) => tryEdit('setBench', { bench: inputs }, false),
});

const partsPanel = new PartsPanel(
  gui,
  (part, values) => {
    // A refused value leaves the document as it was; show its numbers again over what was typed.
    if (!tryEdit('setPart', { part, values }, false)) partsPanel.update(store.doc);
  },
  (axisymmetric) => {
    if (!tryEdit('setAxisymmetric', { axisymmetric }, false)) partsPanel.update(store.doc);
  },
);
partsPanel.update(store.doc);

fillHelp(helpOverlay);
// Escape or a click outside closes the keys list, the history list and any open dialog.
const overlays = new Overlays();
overlays.add({ element: helpOverlay, owners: [byId('help-button')] });
overlays.add({ element: undoControls.list.popover, owners: [undoControls.list.button], onClose: undoControls.refresh });
byId('help-button').addEventListener('click', () => runCommand('toggleHelp'));
byId('open-button').addEventListener('click', () => runCommand('open'));
byId('save-button').addEventListener('click', () => runCommand('save'));
acceptDrops(document.body, fileHandlers);
wireVariantButtons(byId, store, (name, args) => tryEdit(name, args));

/**
 * An edit from a button or a typed field; a refused one is said in the status line and the document stays.
 * `resetSelection` when indices may no longer mean the same thing (another variant). True when it was applied.
 */
function tryEdit(name: string, args: unknown, resetSelection = true, cause: ChangeCause = 'edit'): boolean {
  try {
    store.edit(name, args, cause);
    if (resetSelection) editor.reset();
    return true;
  } catch (error) {
    status.show(plainMessage(error), 'error');
    return false;
  }
}

showDocument(store.doc);
showPartsNumbers(byId('breathing'), bench, store.doc);
bench.showInputs(activeVariant(store.doc).bench, store.doc.activeVariant);
view.fitToView(sectionBounds(activeSection(store.doc)));
solve(store.doc, 'open');
const keeping = mountWorkKeeping({ started, sampleText, say: (m, level) => status.show(m, level), element: byId, now: Date.now });
// After the keeping is mounted, so the adopted inputs are kept in the browser like any change.
const adopted = adoptKeptBench(store.doc, () => bench.takeKeptInputs(), (inputs) => tryEdit('setBench', { bench: inputs }, false));
if (adopted) status.show(adopted);

// For browser tests and the interaction benchmark: read-only handles on the running app.
// `stopSolverWorker` ends the live solver worker as a crash would, for the check that it is replaced.
Object.assign(window, {
  portwright: { store, view, timings, widthStrip: widthEditing.strip, keeping, get lastReply() { return lastReply; }, stopSolverWorker: () => newestWorker?.terminate() },
});
