/** The "Air and bench" calculator panel: a self-contained DOM component over the pure bench model. */

import { formatQuantity } from '../../breathing/index.ts';
import type { BenchInputs } from '../../document/types.ts';
import { sameBench } from '../../editor/edits-bench.ts';
import { buildForm } from './form.ts';
import {
  followApp, initialBenchState, setAreas, setChoice, setPortArea, setUnit, typeField, type BenchAreas, type BenchPanelState,
  type FlowScaleSource,
} from './model.ts';
import { benchInputsOf, stateWithInputs } from './inputs.ts';
import { benchOutputs, flowScaleSpeed } from './outputs.ts';
import { renderResults } from './results.ts';
import { benchStore, type BenchStorage } from './store.ts';
import { injectBenchStyles } from './style.ts';
import { syncForm } from './sync.ts';
import { UNIT_OPTIONS, type PanelUnits } from './units.ts';

export interface BenchPanelOptions {
  /** "Use as flow scale" was pressed: the chosen speed, m/s, for the boundary-layer march. */
  readonly onInletSpeed?: (ms: number) => void;
  /** Units to start in (defaults: mm, m/s, CFM, in H2O, barometer in Pa, °C). */
  readonly units?: Partial<PanelUnits>;
  /** Where the panel's display units are kept between visits (default the page's localStorage); null keeps nothing. */
  readonly storage?: BenchStorage | null;
  /**
   * The porter entered a value or changed a choice: the inputs to keep in the document for the variant shown (one
   * call per typed value, none for a unit switch or the app's own areas). Without it the panel keeps them to itself.
   */
  readonly onInputs?: (bench: BenchInputs) => void;
}

export interface BenchPanel {
  /** Reference areas of the active variant at its lift, m²; {} when it has no valve part. */
  setAreas(areasM2: BenchAreas): void;
  /** Port area for the mean port speed, m², and where it came from ("measured", "round-port assumption"); null: none. */
  setPortArea(m2: number | null, source?: string): void;
  /** Follow the document's length unit. */
  setLengthUnits(units: 'mm' | 'inch'): void;
  /**
   * Show the inputs the document holds for the variant named `owner` (undefined: none typed yet, the panel's
   * defaults). Inputs the panel already shows for that variant are left as they are, with the text as typed.
   */
  showInputs(bench: BenchInputs | undefined, owner: string): void;
  /** The inputs this browser kept before they were saved in the document, once (null when there are none). */
  takeKeptInputs(): BenchInputs | null;
  dispose(): void;
}

let panelCount = 0;

export function mountBenchPanel(host: HTMLElement, options: BenchPanelOptions = {}): BenchPanel {
  const doc = host.ownerDocument;
  injectBenchStyles(doc);
  const idPrefix = `bench-${++panelCount}`;
  const lifetime = new AbortController();
  const signal = lifetime.signal;
  const kept = benchStore(options.storage === undefined ? pageStorage(doc) : options.storage);
  let state: BenchPanelState = kept.restore(initialBenchState(options.units));
  /** The variant whose inputs are shown, and the inputs the document holds for it as far as the panel knows. */
  let owner: string | null = null;
  let shown: BenchInputs | undefined;

  // A fold, like the cautions box: the panel is long and the side bar is shared.
  const root = doc.createElement('details');
  root.className = 'bench-panel';
  root.open = true;
  const title = doc.createElement('summary');
  title.textContent = 'Air and bench';
  const form = buildForm(doc, idPrefix, state, signal, {
    onType: (key, text) => update(typeField(state, key, text)),
    onCommit: () => commit(state),
    onUnit: (quantity, unit) => update(setUnit(state, quantity, unit as never)),
    onHumidityModel: (model) => commit(setChoice(state, 'humidityModel', model)),
    onReferenceArea: (kind) => commit(setChoice(state, 'referenceArea', kind)),
    onFollow: (key) => commit(followApp(state, key)),
  });
  const results = resultsBlock(doc, idPrefix, signal, (speed) => update(setUnit(state, 'speed', speed)));
  const scale = scaleBlock(doc, idPrefix, signal, options.onInletSpeed, {
    choose: (source) => commit(setChoice(state, 'flowScale', source)),
    current: () => state,
  });
  root.append(title, form.element, results.head, results.list, scale.element);
  host.append(root);

  function update(next: BenchPanelState, everyBox = false): void {
    if (signal.aborted) return;
    state = next;
    syncForm(form.refs, state, everyBox);
    results.speed.value = state.units.speed;
    renderResults(results.list, benchOutputs(state));
    scale.sync(state);
    kept.changed(state);
  }
  update(state);

  /** Show `next`, and hand the document its inputs when they changed. */
  function commit(next: BenchPanelState): void {
    update(next);
    const inputs = benchInputsOf(state, shown);
    if (signal.aborted || sameBench(inputs, shown)) return;
    shown = inputs;
    options.onInputs?.(inputs);
  }

  // A reload soon after a unit switch must not lose it to the write delay.
  doc.defaultView?.addEventListener('pagehide', () => kept.flush(), { signal });

  return {
    setAreas: (areasM2) => update(setAreas(state, areasM2)),
    setPortArea: (m2, source) => update(setPortArea(state, m2, source)),
    setLengthUnits: (units) => update(setUnit(state, 'length', units)),
    showInputs: (bench, variant) => {
      if (variant === owner && sameBench(bench, shown)) return;
      owner = variant;
      shown = bench;
      update(stateWithInputs(state, bench), true);
    },
    takeKeptInputs: () => {
      const legacy = kept.takeLegacy(state);
      return legacy === null ? null : benchInputsOf(legacy, undefined);
    },
    dispose: () => {
      kept.flush();
      lifetime.abort();
      root.remove();
    },
  };
}

/** The page's localStorage, or null where reading it throws (storage disabled, sandboxed frame). */
function pageStorage(doc: Document): BenchStorage | null {
  try {
    return doc.defaultView?.localStorage ?? null;
  } catch {
    return null;
  }
}

function resultsBlock(doc: Document, idPrefix: string, signal: AbortSignal, onSpeed: (speed: PanelUnits['speed']) => void) {
  const head = doc.createElement('div');
  head.className = 'bench-results-head';
  const h = doc.createElement('h3');
  h.textContent = 'Results';
  const label = doc.createElement('label');
  label.textContent = 'speeds in ';
  const speed = doc.createElement('select');
  speed.id = `${idPrefix}-speed-unit`;
  label.htmlFor = speed.id;
  for (const o of UNIT_OPTIONS.speed) speed.append(new Option(o.label, o.value));
  speed.addEventListener('change', () => onSpeed(speed.value as PanelUnits['speed']), { signal });
  label.append(speed);
  head.append(h, label);
  const list = doc.createElement('div');
  list.className = 'bench-results';
  return { head, list, speed };
}

const SCALE_CHOICES: ReadonlyArray<[FlowScaleSource, string]> = [
  ['ideal speed', 'ideal speed'],
  ['bench flow / port area', 'bench flow / port area'],
  ['mean port speed', 'mean port speed'],
];

/** The "use as flow scale" row: pick a speed and send it to the boundary-layer march. */
function scaleBlock(
  doc: Document,
  idPrefix: string,
  signal: AbortSignal,
  onInletSpeed: ((ms: number) => void) | undefined,
  state: { choose: (source: FlowScaleSource) => void; current: () => BenchPanelState },
) {
  const element = doc.createElement('div');
  element.className = 'bench-scale';
  const pick = doc.createElement('select');
  pick.id = `${idPrefix}-flow-scale`;
  const label = doc.createElement('label');
  label.htmlFor = pick.id;
  label.textContent = 'Flow scale of the boundary-layer march (inlet speed):';
  for (const [value, text] of SCALE_CHOICES) pick.append(new Option(text, value));
  pick.addEventListener('change', () => state.choose(pick.value as FlowScaleSource), { signal });
  const send = doc.createElement('button');
  send.type = 'button';
  send.textContent = 'Use as flow scale';
  const note = doc.createElement('div');
  note.className = 'bench-scale-note';
  note.setAttribute('aria-live', 'polite');
  send.addEventListener('click', () => {
    const speed = flowScaleSpeed(state.current());
    if (!speed || !onInletSpeed) return;
    onInletSpeed(speed.ms);
    note.textContent = `Boundary-layer march now scaled to ${formatQuantity('speed', state.current().units.speed, speed.ms)} (${speed.label.toLowerCase()}).`;
  }, { signal });
  element.append(label, pick, send, note);
  if (!onInletSpeed) element.hidden = true;
  const sync = (s: BenchPanelState): void => {
    pick.value = s.flowScale;
    const ready = flowScaleSpeed(s) !== null;
    send.disabled = !ready;
    send.title = ready ? 'Send this speed to the boundary-layer march as its flow scale' : `Needs the ${s.flowScale} in the results`;
  };
  return { element, sync };
}
