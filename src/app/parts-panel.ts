/** Typed values of the active variant's valve, seat and test bore (lil-gui), each change sent as one edit. */
import type GUI from 'lil-gui';
import type { Controller } from 'lil-gui';
import type { PortDocument } from '../document/types.ts';
import { activeVariant } from '../editor/index.ts';
import { metresPerUnit } from '../parts/index.ts';

type PartName = 'valve' | 'seat' | 'bore';
type Send = (part: PartName, values: Record<string, unknown>) => void;

interface Field {
  readonly part: PartName;
  readonly key: string;
  readonly label: string;
  /** Length fields show the document's units; others carry their unit in the label. */
  readonly length?: boolean;
  readonly min: number;
  readonly max: number;
  readonly step: number;
}

const FIELDS: readonly Field[] = [
  { part: 'valve', key: 'lift', label: 'lift', length: true, min: 0, max: 40, step: 0.1 },
  { part: 'valve', key: 'diameter', label: 'valve diameter', length: true, min: 10, max: 80, step: 0.1 },
  { part: 'valve', key: 'seatAngleDeg', label: 'seat angle, deg', min: 15, max: 60, step: 0.5 },
  { part: 'valve', key: 'seatFaceWidth', label: 'valve seat face', length: true, min: 0.3, max: 6, step: 0.05 },
  { part: 'valve', key: 'margin', label: 'margin', length: true, min: 0, max: 4, step: 0.05 },
  { part: 'valve', key: 'backCutAngleDeg', label: 'back cut, deg', min: 0, max: 60, step: 0.5 },
  { part: 'valve', key: 'headThickness', label: 'head thickness', length: true, min: 1, max: 15, step: 0.1 },
  { part: 'valve', key: 'stemDiameter', label: 'stem diameter', length: true, min: 3, max: 12, step: 0.1 },
  { part: 'seat', key: 'throatPct', label: 'throat, % of valve', min: 70, max: 99, step: 0.1 },
  { part: 'seat', key: 'seatWidth', label: 'seat width', length: true, min: 0.3, max: 5, step: 0.05 },
  { part: 'seat', key: 'topCutAngleDeg', label: 'top cut, deg', min: 0, max: 60, step: 0.5 },
  { part: 'seat', key: 'bottomCutAngleDeg', label: 'bottom cut, deg', min: 30, max: 89, step: 0.5 },
  { part: 'seat', key: 'throatOffsetPct', label: 'throat offset, % of radius', min: -20, max: 20, step: 0.5 },
  { part: 'bore', key: 'diameter', label: 'bore diameter', length: true, min: 20, max: 200, step: 0.5 },
  { part: 'bore', key: 'depth', label: 'bore depth', length: true, min: 5, max: 200, step: 0.5 },
  { part: 'bore', key: 'valveEdgeToWall', label: 'valve edge to bore wall', length: true, min: 0, max: 60, step: 0.1 },
];

/** The folder of part values; `update` refreshes it from the document after any change. */
export class PartsPanel {
  private readonly values: Record<string, number> = {};
  private readonly controllers: Array<{ field: Field; controller: Controller }> = [];
  private readonly folder: GUI;

  constructor(gui: GUI, private readonly send: Send) {
    this.folder = gui.addFolder('Valve, seat and test bore');
    for (const field of FIELDS) {
      const id = `${field.part}.${field.key}`;
      this.values[id] = 0;
      const controller = this.folder.add(this.values, id, field.min, field.max, field.step).name(field.label)
        .onFinishChange((v: number) => this.send(field.part, { [field.key]: v }));
      this.controllers.push({ field, controller });
    }
  }

  /** Show the active variant's parts; hide the folder when it has none, and fields of parts it lacks. */
  update(doc: PortDocument): void {
    const parts = activeVariant(doc).parts;
    this.folder.show(parts?.valve !== undefined);
    // FIELDS' limits are in mm.
    const scale = metresPerUnit('mm') / metresPerUnit(doc.units);
    for (const { field, controller } of this.controllers) {
      const part = parts?.[field.part] as Record<string, unknown> | undefined;
      const value = part?.[field.key];
      controller.show(typeof value === 'number');
      if (typeof value !== 'number') continue;
      if (field.length) controller.min(field.min * scale).max(field.max * scale).step(roundStep(field.step * scale));
      controller.name(field.length ? `${field.label}, ${doc.units}` : field.label);
      this.values[`${field.part}.${field.key}`] = value;
      controller.updateDisplay();
    }
  }
}

/** A step of one significant digit (0.0039 in becomes 0.001 in), so the field shows tidy decimals. */
function roundStep(step: number): number {
  return 10 ** Math.floor(Math.log10(step));
}
