/** Typed values of the active variant's valve, seat and test bore, and its round model (lil-gui), each change sent as one edit. */
import type GUI from 'lil-gui';
import type { Controller } from 'lil-gui';
import type { AxisymmetricModel, PortDocument } from '../document/types.ts';
import { lengthLabel } from '../breathing/units.ts';
import { activeVariant } from '../editor/index.ts';
import { metresPerUnit } from '../parts/index.ts';
import { showRounded, typedChange, type BoxUnit } from './box-precision.ts';

type PartName = 'valve' | 'seat' | 'bore';
type Send = (part: PartName, values: Record<string, unknown>) => void;
/** Sends the round model (setAxisymmetric), or null for a plane section again. */
type SendRound = (axisymmetric: AxisymmetricModel | null) => void;

interface Field {
  readonly part: PartName;
  readonly key: string;
  readonly label: string;
  /** Length fields show the document's units; others carry their unit in the label. */
  readonly length?: boolean;
  /** The unit of a field that is not a length (degrees or percent), for its rounding. */
  readonly unit?: BoxUnit;
  readonly min: number;
  readonly max: number;
  readonly step: number;
}

const FIELDS: readonly Field[] = [
  { part: 'valve', key: 'lift', label: 'lift', length: true, min: 0, max: 40, step: 0.1 },
  { part: 'valve', key: 'diameter', label: 'valve diameter', length: true, min: 10, max: 80, step: 0.1 },
  { part: 'valve', key: 'seatAngleDeg', unit: 'deg', label: 'seat angle, °', min: 15, max: 60, step: 0.5 },
  { part: 'valve', key: 'seatFaceWidth', label: 'valve seat face', length: true, min: 0.3, max: 6, step: 0.05 },
  { part: 'valve', key: 'margin', label: 'margin', length: true, min: 0, max: 4, step: 0.05 },
  { part: 'valve', key: 'backCutAngleDeg', unit: 'deg', label: 'back cut, °', min: 0, max: 60, step: 0.5 },
  { part: 'valve', key: 'headThickness', label: 'head thickness', length: true, min: 1, max: 15, step: 0.1 },
  { part: 'valve', key: 'stemDiameter', label: 'stem diameter', length: true, min: 3, max: 12, step: 0.1 },
  { part: 'seat', key: 'throatPct', unit: 'percent', label: 'throat, % of valve', min: 70, max: 99, step: 0.1 },
  { part: 'seat', key: 'seatWidth', label: 'seat width', length: true, min: 0.3, max: 5, step: 0.05 },
  { part: 'seat', key: 'topCutAngleDeg', unit: 'deg', label: 'top cut, °', min: 0, max: 60, step: 0.5 },
  { part: 'seat', key: 'bottomCutAngleDeg', unit: 'deg', label: 'bottom cut, °', min: 30, max: 89, step: 0.5 },
  { part: 'seat', key: 'throatOffsetPct', unit: 'percent', label: 'throat offset, % of radius', min: -20, max: 20, step: 0.5 },
  { part: 'bore', key: 'diameter', label: 'bore diameter', length: true, min: 20, max: 200, step: 0.5 },
  { part: 'bore', key: 'depth', label: 'bore depth', length: true, min: 5, max: 200, step: 0.5 },
  { part: 'bore', key: 'valveEdgeToWall', label: 'valve edge to bore wall', length: true, min: 0, max: 60, step: 0.1 },
];

/** The folder of part values; `update` refreshes it from the document after any change. */
export class PartsPanel {
  /** What the boxes hold: the document's exact values until a box is typed in. */
  private readonly values: Record<string, number> = {};
  /** The document's exact values, by `part.key`. */
  private readonly exact: Record<string, number> = {};
  private units: PortDocument['units'] = 'mm';
  private readonly controllers: Array<{ field: Field; controller: Controller }> = [];
  private readonly folder: GUI;
  /** The round toggle's state, as the document has it until the porter changes it. */
  private readonly round = { on: false, side: 'left' as AxisymmetricModel['keep'] };
  private model: AxisymmetricModel | undefined;
  private readonly roundControllers: Controller[] = [];

  /** Without `sendRound` the panel has no round toggle. */
  constructor(gui: GUI, private readonly send: Send, sendRound?: SendRound) {
    this.folder = gui.addFolder('Valve, seat and test bore');
    if (sendRound) this.addRoundToggle(sendRound);
    for (const field of FIELDS) {
      const id = `${field.part}.${field.key}`;
      this.values[id] = 0;
      const controller = looseStep(this.folder.add(this.values, id, field.min, field.max), field.step).name(field.label);
      // Typed numbers are kept as typed (not snapped to the slider's step); the shown rounding typed again is no change.
      controller.onFinishChange((v: number) => {
        const change = typedChange(v, this.exact[id] ?? v, this.boxUnit(field));
        if (change !== null) return this.send(field.part, { [field.key]: change });
        this.values[id] = this.exact[id] ?? v;
        controller.updateDisplay();
      });
      showRounded(controller, () => this.boxUnit(field));
      this.controllers.push({ field, controller });
    }
  }

  /** Show the active variant's parts; hide the folder when it has none, and fields of parts it lacks. */
  update(doc: PortDocument): void {
    const parts = activeVariant(doc).parts;
    this.units = doc.units;
    this.folder.show(parts?.valve !== undefined);
    this.model = activeVariant(doc).axisymmetric;
    this.round.on = this.model !== undefined;
    this.round.side = this.model?.keep ?? this.round.side;
    for (const controller of this.roundControllers) controller.updateDisplay();
    // FIELDS' limits are in mm.
    const scale = metresPerUnit('mm') / metresPerUnit(doc.units);
    for (const { field, controller } of this.controllers) {
      const part = parts?.[field.part] as Record<string, unknown> | undefined;
      const value = part?.[field.key];
      controller.show(typeof value === 'number');
      if (typeof value !== 'number') continue;
      if (field.length) {
        // Limits on the step's own grid, so the slider lands on tidy values (0.394 in, not 0.3947 in).
        const step = roundStep(field.step * scale);
        looseStep(controller.min(onGrid(field.min * scale, step)).max(onGrid(field.max * scale, step)), step);
      }
      controller.name(field.length ? `${field.label}, ${lengthLabel(doc.units)}` : field.label);
      this.values[`${field.part}.${field.key}`] = value;
      this.exact[`${field.part}.${field.key}`] = value;
      controller.updateDisplay();
    }
  }

  /**
   * "round about the valve axis": the valve, seat and bore region solved as round (b = 2 pi r), keeping the side
   * chosen (left or right looking the way the valve opens). A model with an axis of its own keeps that axis.
   */
  private addRoundToggle(sendRound: SendRound): void {
    const sendNow = () => sendRound(this.round.on ? { ...(this.model?.axis ? { axis: this.model.axis } : {}), keep: this.round.side } : null);
    const toggle = this.folder.add(this.round, 'on').name('round about the valve axis').onChange(sendNow);
    const side = this.folder.add(this.round, 'side', ['left', 'right']).name('side solved (looking the way the valve opens)').onChange(() => {
      if (this.round.on) sendNow();
    });
    this.roundControllers.push(toggle, side);
  }

  private boxUnit(field: Field): BoxUnit {
    return field.unit ?? this.units;
  }
}

/** The slider and arrow keys move by `step`; a typed number is kept as typed (lil-gui's step that is not "explicit"). */
function looseStep(controller: Controller, step: number): Controller {
  return (controller as unknown as { step(step: number, explicit: boolean): Controller }).step(step, false);
}

function onGrid(value: number, step: number): number {
  return Number((Math.round(value / step) * step).toPrecision(12));
}

/** A step of one significant digit (0.0039 in becomes 0.001 in), so the field shows tidy decimals. */
function roundStep(step: number): number {
  return 10 ** Math.floor(Math.log10(step));
}
