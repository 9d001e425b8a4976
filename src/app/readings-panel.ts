/** The readings beside the field: the numbers the solver and the flow reading computed, and the ranked findings. */
import { areaLabel, lengthLabel } from '../breathing/units.ts';
import type { Units } from '../document/types.ts';
import { MODEL_WORDS, type Finding, type FlowReading } from '../solver/reading/index.ts';
import type { FieldReply } from '../workers/protocol.ts';
import { heading, readingTable, type ReadingRow } from './panel-table.ts';
import { stationAreas } from './station-areas.ts';

export interface ReadingsHooks {
  /** A finding was clicked: zoom the view to its place. */
  readonly onFinding: (finding: Finding) => void;
}

export class ReadingsPanel {
  constructor(private readonly host: HTMLElement, private readonly hooks: ReadingsHooks) {}

  show(reply: FieldReply, units: Units, refineMs: number): void {
    const digits = units === 'mm' ? 1 : 3;
    const label = lengthLabel(units);
    const reading = reply.reading;
    const rows: ReadingRow[] = [
      ['model', MODEL_WORDS[reading?.model ?? 'plane'], 'model'],
      ['grid', `${reply.nx} × ${reply.ny} cells, ${reply.h.toFixed(units === 'mm' ? 2 : 4)} ${label}`],
      ['solve', `${reply.iterations} iterations, residual ${reply.residual.toExponential(1)}, ${refineMs.toFixed(0)} ms`],
      ['peak speed ratio (clear of sharp corners)', peakText(reply.peak, digits), 'peak'],
    ];
    // The port's walls are what a porter can change; the bench's bore and the valve are in the plots.
    for (const wall of reading?.walls ?? []) {
      if (wall.inPort) rows.push([`${wall.name}, fastest wall flow`, `${wall.peak.speedRatio.toFixed(3)}`, `${slug(wall.name)}-peak`]);
    }
    if (reading?.tightest) rows.push(['tightest section', `${reading.tightest.width.toFixed(digits)} ${label} wide`, 'tightest']);
    if (reading) rows.push(...areaRows(reading, units));
    const model = reading?.model ?? 'plane';
    if (reading) rows.push(['slow share', `${(100 * reading.slow.share).toFixed(1)}% of the port and bowl${model === 'plane' ? '' : ' by volume'}`, 'slow-share']);
    rows.push(['conductance', model === 'plane' ? `${reply.conductance.toFixed(4)} (per unit depth)` : `${sig(reply.conductance)} ${label} (${MODEL_WORDS[model]})`, 'conductance']);
    // the stations' table stays open across solves once opened
    const open = this.host.querySelector('details[data-reading="station-areas"]')?.hasAttribute('open') ?? false;
    const stations = reading && reading.stations.length > 0 ? [stationAreas(reading, units, open)] : [];
    this.host.replaceChildren(heading('Readings'), readingTable(rows), ...stations, ...this.findings(reading?.findings ?? []));
  }

  showStale(message: string): void {
    this.host.dataset.stale = 'true';
    this.host.title = message;
  }

  clearStale(): void {
    delete this.host.dataset.stale;
    this.host.title = '';
  }

  private findings(findings: readonly Finding[]): HTMLElement[] {
    if (findings.length === 0) return [];
    const list = document.createElement('ol');
    list.className = 'findings';
    for (const finding of findings) {
      const item = document.createElement('li');
      const button = document.createElement('button');
      button.type = 'button';
      button.textContent = finding.text;
      button.title = 'Show this place';
      button.addEventListener('click', () => this.hooks.onFinding(finding));
      item.append(button);
      list.append(item);
    }
    return [heading('Findings'), list];
  }
}

/**
 * Least area ahead of the valve and port volume in the document's units; in the plane model both are per unit depth
 * (an area per mm of depth is the station's width, a volume per mm the section's area), and say so.
 */
function areaRows(reading: FlowReading, units: Units): ReadingRow[] {
  const per = reading.model === 'plane' ? ` per ${lengthLabel(units)} of depth` : '';
  const volume = units === 'mm' ? 'mm³' : 'in³';
  const rows: ReadingRow[] = [];
  if (reading.tightest) rows.push(['least area ahead of the valve', `${sig(reading.tightest.area)} ${areaLabel(units)}${per}`, 'least-area']);
  rows.push(['port volume (port and bowl)', `${sig(reading.portVolume)} ${volume}${per}`, 'port-volume']);
  return rows;
}

/** Four significant figures, without an exponent for the sizes a port has. */
function sig(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(4))) : '-';
}

function slug(name: string): string {
  return name.toLowerCase().replace(/[^a-z0-9]+/g, '-');
}

/**
 * The solver's peak, kept clear of sharp convex corners and of cells cut by a wall: "3.54 at (x, y)". The colour
 * bar's corner spike is a different number on purpose (the highest cell, at a corner); a section whose every
 * whole cell lies beside a sharp corner has no such peak, said in words.
 */
function peakText(peak: FieldReply['peak'], digits: number): string {
  if (!Number.isFinite(peak.speedRatio)) return 'none: every whole cell lies beside a sharp corner';
  return `${peak.speedRatio.toFixed(2)} at (${peak.x.toFixed(digits)}, ${peak.y.toFixed(digits)})`;
}
