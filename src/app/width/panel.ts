/**
 * The width table in the side panel: the active variant's passage width at stations along the port and its
 * obstructions (valve stem, guide boss), typed; each committed change is one setWidthProfile edit.
 */
import { lengthLabel } from '../../breathing/units.ts';
import type { PortDocument, Section, Units, ValvePart, WidthProfile } from '../../document/types.ts';
import { activeSection, activeVariant } from '../../editor/index.ts';
import { sectionBounds } from '../../geometry/index.ts';
import { pointUpAxis } from './along.ts';
import { boxText, typedChange } from '../box-precision.ts';
import { heading } from '../panel-table.ts';
import {
  addObstruction, addStation, removeObstruction, removeStation, setObstructionValue, setStationValue, startProfile,
  typicalPortWidth, WidthTableError, type ObstructionField, type StationField, type ValveHint,
} from './table.ts';

export interface WidthPanelHooks {
  /** Commit a new profile (null: none) as one edit; false when the store refused it (it has said why). */
  readonly send: (profile: WidthProfile | null) => boolean;
  /** Say why a typed value was refused, in whole sentences. */
  readonly refuse: (message: string) => void;
  /** Distance along the port of the seat, document units, for a new profile's second station (null when unknown). */
  readonly seatAlong: () => number | null;
}

/** Which model the active variant is solved with, as the heading and the strip say it. */
export function modelWords(profile: WidthProfile | undefined): string {
  return profile ? 'width profile (width-weighted flow)' : 'plane, per unit depth';
}

export class WidthPanel {
  private doc: PortDocument | null = null;
  /** What the drawn table's rows and buttons depend on; the same layout is refreshed in place, keeping the focus. */
  private layout = '';

  constructor(private readonly host: HTMLElement, private readonly hooks: WidthPanelHooks) {}

  /** Show the active variant's profile (again: a refused value is replaced by the document's). */
  show(doc: PortDocument): void {
    this.doc = doc;
    const variant = activeVariant(doc);
    const profile = variant.width;
    const model = document.createElement('p');
    model.className = 'width-model';
    model.dataset.reading = 'width-model';
    model.textContent = `Model: ${modelWords(profile)}.`;
    const valve = variant.parts?.valve;
    const layout = `${doc.units} ${profile?.stations.length ?? 'none'} ${profile?.obstructions?.length ?? 0} ${valve !== undefined}`;
    // The same rows: only the values change, so a porter tabbing from box to box keeps the box they moved to.
    if (layout === this.layout && profile) return this.refresh(profile, doc.units);
    this.layout = layout;
    const title = heading('Width profile');
    if (!profile) return this.host.replaceChildren(title, model, this.startBox(doc.units));
    this.host.replaceChildren(title, model, this.stationTable(profile, doc.units), this.stationButtons(profile),
      this.obstructionTable(profile, doc.units), this.obstructionButtons(profile, doc.units, valve ? valveHint(valve, activeSection(doc)) : null));
  }

  /** Every box shows the document's value again (rounded), the one being typed in included. */
  private refresh(profile: WidthProfile, units: Units): void {
    for (const input of this.host.querySelectorAll<HTMLInputElement>('input[data-field]')) {
      const [kind, field, index] = (input.dataset.field ?? '').split('-');
      const k = Number(index);
      const value = kind === 'width' ? profile.stations[k]?.[field as StationField] : profile.obstructions?.[k]?.[field as ObstructionField];
      input.value = typeof value === 'number' ? boxText(value, units) : (value ?? '');
    }
  }

  private startBox(units: Units): HTMLElement {
    const box = document.createElement('div');
    const note = document.createElement('p');
    note.className = 'part-note';
    note.textContent = 'No width profile (per unit depth).';
    const start = button('Start a width profile', 'width-start', () => {
      this.commit(() => startProfile(this.hooks.seatAlong() ?? 0, units));
    });
    start.title = `Two stations, at the manifold face and at the seat, both ${boxText(typicalPortWidth(units), units)} ${lengthLabel(units)} wide ` +
      '(a typical street port); type your port\'s own widths.';
    box.append(note, start);
    return box;
  }

  private stationTable(profile: WidthProfile, units: Units): HTMLTableElement {
    const table = document.createElement('table');
    table.className = 'width-table';
    const unit = lengthLabel(units);
    headRow(table, ['', `along, ${unit}`, `width, ${unit}`, '']);
    profile.stations.forEach((station, k) => {
      const row = table.insertRow();
      row.insertCell().textContent = String(k + 1);
      for (const field of ['along', 'width'] as const satisfies readonly StationField[]) {
        const box = numberBox(() => this.profile()?.stations[k]?.[field] ?? station[field], units, (v) => this.commit((p) => setStationValue(p, k, field, v, units)));
        box.dataset.field = `width-${field}-${k}`;
        row.insertCell().append(box);
      }
      const remove = button('×', `width-remove-${k}`, () => this.commit((p) => removeStation(p, k)));
      remove.title = profile.stations.length > 2 ? `Remove station ${k + 1}` : 'A width profile needs at least two stations.';
      remove.disabled = profile.stations.length <= 2;
      row.insertCell().append(remove);
    });
    return table;
  }

  private stationButtons(profile: WidthProfile): HTMLElement {
    const row = document.createElement('div');
    row.className = 'width-buttons';
    const add = button('Add station', 'width-add-station', () => this.commit((p) => addStation(p)));
    add.title = 'A station halfway across the longest gap between two stations.';
    const none = button('Remove profile', 'width-remove-profile', () => this.hooks.send(null));
    none.title = `Solve per unit depth again (${profile.stations.length} stations dropped; Undo brings them back).`;
    row.append(add, none);
    return row;
  }

  private obstructionTable(profile: WidthProfile, units: Units): HTMLElement {
    const list = profile.obstructions ?? [];
    const table = document.createElement('table');
    table.className = 'width-table width-obstructions';
    if (list.length === 0) return table;
    const unit = lengthLabel(units);
    headRow(table, ['name', `Ø, ${unit}`, 'from', 'to', '']);
    list.forEach((o, k) => {
      const row = table.insertRow();
      const name = document.createElement('input');
      name.value = o.name;
      name.dataset.field = `obstruction-name-${k}`;
      name.addEventListener('change', () => this.commit((p) => setObstructionValue(p, k, 'name', name.value, units)));
      row.insertCell().append(name);
      for (const field of ['diameter', 'from', 'to'] as const satisfies readonly ObstructionField[]) {
        const box = numberBox(() => this.profile()?.obstructions?.[k]?.[field] ?? o[field], units, (v) => this.commit((p) => setObstructionValue(p, k, field, v, units)));
        box.dataset.field = `obstruction-${field}-${k}`;
        if (field !== 'diameter') box.removeAttribute('min');
        row.insertCell().append(box);
      }
      row.insertCell().append(button('×', `obstruction-remove-${k}`, () => this.commit((p) => removeObstruction(p, k))));
    });
    return table;
  }

  private obstructionButtons(profile: WidthProfile, units: Units, valve: ValveHint | null): HTMLElement {
    const row = document.createElement('div');
    row.className = 'width-buttons';
    const add = button('Add obstruction', 'width-add-obstruction', () => this.commit((p) => addObstruction(p, units, valve)));
    add.disabled = valve === null;
    add.title = valve
      ? 'A valve stem or guide boss: its diameter and its stretch up the valve axis from the gauge line (from, to).'
      : 'An obstruction stands on the valve axis: this variant needs a valve first.';
    row.append(add);
    if ((profile.obstructions ?? []).length > 0) {
      const note = document.createElement('p');
      note.className = 'part-note';
      note.textContent = `From and to: ${lengthLabel(units)} up the valve axis from the gauge-line centre.`;
      row.append(note);
    }
    return row;
  }

  private profile(): WidthProfile | undefined {
    return this.doc ? activeVariant(this.doc).width : undefined;
  }

  /** Apply a change to the shown profile; a refused one is said and the table shows the document again. */
  private commit(change: (profile: WidthProfile) => WidthProfile): void {
    const doc = this.doc;
    if (!doc) return;
    const profile = activeVariant(doc).width ?? { stations: [] };
    let next: WidthProfile;
    try {
      next = change(profile);
    } catch (error) {
      if (!(error instanceof WidthTableError)) throw error;
      this.hooks.refuse(error.message);
      return this.show(doc);
    }
    if (!this.hooks.send(next)) this.show(doc);
  }
}

/**
 * What an added stem takes from the valve: its diameter, from the valve's back up the axis to past the section's
 * box, so the stem runs on through the roof into the metal (one that stops on a wall leaves the cells along it wider).
 */
function valveHint(valve: ValvePart, section: Section): ValveHint {
  // Up the axis from the gauge line: the valve's back sits about a head thickness above its face, the face `lift` below.
  const back = Math.max(0, valve.headThickness - valve.lift);
  const box = sectionBounds(section);
  const [upX, upY] = pointUpAxis(valve, 1).map((v, k) => v - (k === 0 ? valve.axis.x : valve.axis.y));
  const corners = [[box.minX, box.minY], [box.minX, box.maxY], [box.maxX, box.minY], [box.maxX, box.maxY]];
  const top = Math.max(...corners.map(([x, y]) => (x - valve.axis.x) * upX + (y - valve.axis.y) * upY));
  return { stemDiameter: valve.stemDiameter, stemFrom: back, stemTo: Math.max(back + valve.stemDiameter, top) };
}

/** A number box showing the value `exact` reads now, rounded to the unit; a committed other number is sent as typed (NaN when emptied). */
function numberBox(exact: () => number, units: Units, onChange: (v: number) => void): HTMLInputElement {
  const input = document.createElement('input');
  input.type = 'number';
  input.step = 'any';
  input.min = '0';
  input.value = boxText(exact(), units);
  input.addEventListener('change', () => {
    const typed = input.value.trim() === '' ? Number.NaN : Number(input.value);
    if (Number.isNaN(typed)) return onChange(Number.NaN);
    const change = typedChange(typed, exact(), units);
    if (change === null) input.value = boxText(exact(), units);
    else onChange(change);
  });
  return input;
}

function button(text: string, id: string, onClick: () => void): HTMLButtonElement {
  const b = document.createElement('button');
  b.type = 'button';
  b.textContent = text;
  b.dataset.action = id;
  b.addEventListener('click', onClick);
  return b;
}

function headRow(table: HTMLTableElement, labels: readonly string[]): void {
  const row = table.createTHead().insertRow();
  for (const label of labels) row.append(Object.assign(document.createElement('th'), { textContent: label }));
}
