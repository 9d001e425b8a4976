/** Typed values for what is selected: a corner's fillet radius, an edge's role and wall name. Each change is one edit. */
import { lengthLabel } from '../breathing/units.ts';
import type { PortDocument } from '../document/types.ts';
import { WALL_NAMES } from '../document/types.ts';
import { activeSection, type HandleRef } from '../editor/index.ts';
import { boxText, typedChange, type BoxUnit } from './box-precision.ts';

type Send = (name: string, args: unknown) => void;

export class SelectionPanel {
  constructor(private readonly host: HTMLElement, private readonly send: Send) {}

  show(doc: PortDocument, selection: HandleRef | null): void {
    if (!selection || selection.kind === 'lift' || selection.kind === 'valve-axis') return this.host.replaceChildren();
    const section = activeSection(doc);
    const island = selection.island;
    const outline = island === undefined ? section.outline : section.islands[island]?.outline;
    if (!outline) return this.host.replaceChildren();
    const title = document.createElement('h3');
    if (selection.kind === 'vertex' || selection.kind === 'fillet') {
      const vertex = outline.vertices[selection.vertex];
      if (!vertex) return this.host.replaceChildren();
      title.textContent = `Corner ${selection.vertex + 1}${island === undefined ? '' : ` of ${section.islands[island].name}`}`;
      const radius = numberInput(vertex.filletRadius ?? 0, doc.units, (r) => this.send('setFilletRadius', { vertex: selection.vertex, island, radius: r }));
      radius.dataset.field = 'fillet-radius';
      return this.host.replaceChildren(title, row(`fillet radius, ${lengthLabel(doc.units)}`, radius));
    }
    const edgeIndex = 'edge' in selection ? selection.edge : -1;
    const edge = outline.edges[edgeIndex];
    if (!edge) return this.host.replaceChildren();
    title.textContent = `Edge ${edgeIndex + 1} (${edge.kind === 'line' ? 'straight' : edge.kind})`;
    const role = document.createElement('select');
    for (const r of ['wall', 'inlet', 'outlet']) role.add(new Option(r, r, false, r === edge.role));
    role.disabled = island !== undefined;
    role.addEventListener('change', () => this.send('setEdgeRole', { edge: edgeIndex, island, role: role.value }));
    const name = document.createElement('input');
    name.value = edge.wallName ?? '';
    name.placeholder = 'e.g. short side';
    name.setAttribute('list', 'wall-names');
    name.disabled = edge.role !== 'wall';
    name.addEventListener('change', () => this.send('setWallName', { edge: edgeIndex, island, name: name.value.trim() }));
    this.host.replaceChildren(title, row('role', role), row('wall name', name), wallNameList());
  }
}

/** A box showing `exact` rounded to its unit; a committed number other than the shown one is sent as typed. */
function numberInput(exact: number, unit: BoxUnit, onChange: (v: number) => void): HTMLInputElement {
  const input = document.createElement('input');
  input.type = 'number';
  input.min = '0';
  input.step = 'any';
  input.value = boxText(exact, unit);
  input.addEventListener('change', () => {
    const change = input.value.trim() === '' ? null : typedChange(Number(input.value), exact, unit);
    if (change === null) input.value = boxText(exact, unit);
    else onChange(change);
  });
  return input;
}

function row(label: string, control: HTMLElement): HTMLElement {
  const element = document.createElement('label');
  element.className = 'selection-row';
  element.append(label, control);
  return element;
}

function wallNameList(): HTMLDataListElement {
  const list = document.createElement('datalist');
  list.id = 'wall-names';
  for (const n of WALL_NAMES) list.append(new Option(n));
  return list;
}
