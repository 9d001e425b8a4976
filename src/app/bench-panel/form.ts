/** The bench panel's input form: labelled number fields with unit selects and messages, in three groups. */

import type { HumidAirModel, ReferenceArea } from '../../breathing/index.ts';
import { FIELDS, unitLabel, type FieldKey } from './fields.ts';
import { setLabelText } from './text.ts';
import type { BenchPanelState, FollowingField } from './model.ts';
import { quantityOf, UNIT_OPTIONS, type PanelQuantity, type PanelUnits } from './units.ts';

export interface FieldRefs {
  readonly input: HTMLInputElement;
  /** Unit select of a switchable field, or the plain unit text. */
  readonly unit: HTMLSelectElement | HTMLElement;
  readonly error: HTMLElement;
  /** Where a field that follows the app says so (port area, valve diameter). */
  readonly hint: HTMLElement | null;
}

export interface FormRefs {
  readonly fields: Record<FieldKey, FieldRefs>;
  readonly unitSelects: ReadonlyArray<{ readonly quantity: PanelQuantity; readonly select: HTMLSelectElement }>;
  readonly humidityModel: HTMLSelectElement;
  readonly referenceArea: HTMLSelectElement;
  /** Under the C_D choice: the area it is against, or that there is none. */
  readonly referenceHint: HTMLElement;
}

export interface FormHandlers {
  readonly onType: (key: FieldKey, text: string) => void;
  /** The field's value was entered (Enter, or leaving the field after a change): one typed value. */
  readonly onCommit: (key: FieldKey) => void;
  readonly onUnit: (quantity: PanelQuantity, unit: string) => void;
  readonly onHumidityModel: (model: HumidAirModel) => void;
  readonly onReferenceArea: (kind: ReferenceArea) => void;
  readonly onFollow: (key: FollowingField) => void;
}

const GROUPS: ReadonlyArray<{ title: string; fields: readonly FieldKey[]; choice?: 'humidityModel' | 'referenceArea' }> = [
  { title: 'Room air', fields: ['temperature', 'barometric', 'humidity'], choice: 'humidityModel' },
  { title: 'Bench reading', fields: ['testPressure', 'flow'], choice: 'referenceArea' },
  { title: 'Engine', fields: ['bore', 'stroke', 'rpm', 'cylinders', 'portArea', 'valveDiameter', 'flowCoefficient', 'hpPerCfm'] },
];

const HUMIDITY_MODELS: ReadonlyArray<[HumidAirModel, string]> = [['cipm-2007', 'CIPM-2007'], ['ideal-mixture', 'ideal mixture']];
const REFERENCE_AREAS: readonly ReferenceArea[] = ['curtain', 'throat', 'valve head'];

/** Builds the form; listeners end when `signal` aborts. */
export function buildForm(doc: Document, idPrefix: string, state: BenchPanelState, signal: AbortSignal, on: FormHandlers) {
  const form = doc.createElement('div');
  form.className = 'bench-form';
  const fields = {} as Record<FieldKey, FieldRefs>;
  const unitSelects: Array<{ quantity: PanelQuantity; select: HTMLSelectElement }> = [];
  const make = <K extends keyof HTMLElementTagNameMap>(tag: K, className = '', text = ''): HTMLElementTagNameMap[K] => {
    const el = doc.createElement(tag);
    if (className) el.className = className;
    if (text) el.textContent = text;
    return el;
  };
  const choices: Partial<Record<'humidityModel' | 'referenceArea', { select: HTMLSelectElement; hint: HTMLElement }>> = {};
  for (const group of GROUPS) {
    form.append(make('h4', '', group.title));
    for (const key of group.fields) {
      const refs = fieldRow(make, `${idPrefix}-${key}`, key, state.units, signal, on);
      fields[key] = refs.refs;
      form.append(...refs.nodes);
      const quantity = quantityOf(FIELDS[key].kind);
      if (quantity) unitSelects.push({ quantity, select: refs.refs.unit as HTMLSelectElement });
    }
    if (group.choice) {
      const { nodes, select, hint } = choiceRow(make, `${idPrefix}-${group.choice}`, group.choice, signal, on);
      choices[group.choice] = { select, hint };
      form.append(...nodes);
    }
  }
  const refs: FormRefs = {
    fields,
    unitSelects,
    humidityModel: choices.humidityModel!.select,
    referenceArea: choices.referenceArea!.select,
    referenceHint: choices.referenceArea!.hint,
  };
  return { element: form, refs };
}

type Make = <K extends keyof HTMLElementTagNameMap>(tag: K, className?: string, text?: string) => HTMLElementTagNameMap[K];

function fieldRow(make: Make, id: string, key: FieldKey, units: PanelUnits, signal: AbortSignal, on: FormHandlers) {
  const spec = FIELDS[key];
  const label = make('label');
  setLabelText(label, spec.label);
  label.htmlFor = id;
  const input = make('input');
  Object.assign(input, { id, type: 'text', inputMode: 'decimal', autocomplete: 'off', spellcheck: false });
  input.placeholder = spec.placeholder ?? '';
  input.dataset.field = key;
  input.addEventListener('input', () => on.onType(key, input.value), { signal });
  input.addEventListener('change', () => on.onCommit(key), { signal });
  const error = make('div', 'bench-error');
  error.id = `${id}-error`;
  error.setAttribute('aria-live', 'polite');
  input.setAttribute('aria-describedby', error.id);
  const unit = spec.kind === 'plain' ? make('span', 'bench-unit', unitLabel(key, units)) : unitSelect(make, key, signal, on);
  const hint = key === 'portArea' || key === 'valveDiameter' ? make('div', 'bench-hint') : null;
  const note = spec.note ? make('div', 'bench-field-note', spec.note) : null;
  if (hint) hint.addEventListener('click', (e) => {
    if ((e.target as HTMLElement).closest('button')) on.onFollow(key as FollowingField);
  }, { signal });
  const nodes: HTMLElement[] = [label, input, unit, error];
  if (hint) nodes.push(hint);
  if (note) nodes.push(note);
  return { nodes, refs: { input, unit, error, hint } };
}

function unitSelect(make: Make, key: FieldKey, signal: AbortSignal, on: FormHandlers): HTMLSelectElement {
  const kind = FIELDS[key].kind;
  const quantity = quantityOf(kind)!;
  const select = make('select');
  select.title = kind === 'area' ? 'Area follows the length unit' : `Unit for ${quantity === 'barometer' ? 'the barometer' : quantity}`;
  select.setAttribute('aria-label', `${FIELDS[key].label} unit`);
  for (const option of UNIT_OPTIONS[quantity]) {
    const label = kind === 'area' ? `${option.label}²` : option.label;
    select.append(new Option(label, option.value));
  }
  select.addEventListener('change', () => on.onUnit(quantity, select.value), { signal });
  return select;
}

function choiceRow(make: Make, id: string, which: 'humidityModel' | 'referenceArea', signal: AbortSignal, on: FormHandlers) {
  const label = make('label');
  setLabelText(label, which === 'humidityModel' ? 'Humid-air formula' : 'C_D against');
  label.htmlFor = id;
  const select = make('select', 'bench-wide');
  select.id = id;
  if (which === 'humidityModel') {
    for (const [value, text] of HUMIDITY_MODELS) select.append(new Option(text, value));
    select.addEventListener('change', () => on.onHumidityModel(select.value as HumidAirModel), { signal });
  } else {
    for (const kind of REFERENCE_AREAS) select.append(new Option(kind, kind));
    select.addEventListener('change', () => on.onReferenceArea(select.value as ReferenceArea), { signal });
  }
  const hint = make('div', 'bench-hint');
  return { nodes: which === 'referenceArea' ? [label, select, hint] : [label, select], select, hint };
}
