/** Plots beside the field: station width and mean speed along the port, its cross-section area (CSA), and speed along a chosen wall. */
import { areaLabel, lengthLabel } from '../breathing/units.ts';
import type { Units } from '../document/types.ts';
import type { FlowReading } from '../solver/reading/index.ts';
import { drawPlot, type PlotSeries } from '../view/line-plot.ts';

const WALL_COLOURS = ['#e8a33d', '#5ec8e5', '#b59cff'];

export class PlotsPanel {
  private readonly stationsCanvas = document.createElement('canvas');
  private readonly areaCanvas = document.createElement('canvas');
  private readonly wallCanvas = document.createElement('canvas');
  private readonly wallPick = document.createElement('select');
  private readonly wallCaption = document.createElement('p');
  private reading: FlowReading | null = null;
  private units = 'mm';
  private areaUnits = 'mm²';

  constructor(host: HTMLElement) {
    for (const c of [this.stationsCanvas, this.areaCanvas, this.wallCanvas]) c.style.cssText = 'width:100%;height:165px;display:block';
    this.wallPick.addEventListener('change', () => this.drawWalls());
    const pickRow = document.createElement('label');
    pickRow.className = 'plot-pick';
    pickRow.append('Wall speed along ', this.wallPick);
    this.wallCaption.className = 'plot-caption';
    this.wallCaption.dataset.reading = 'wall-fall';
    this.areaCanvas.dataset.plot = 'csa';
    host.replaceChildren(this.stationsCanvas, this.areaCanvas, pickRow, this.wallCanvas, this.wallCaption);
  }

  show(reading: FlowReading, units: Units): void {
    this.reading = reading;
    this.units = lengthLabel(units);
    this.areaUnits = areaLabel(units);
    const names = reading.walls.map((w) => w.name);
    const keep = names.includes(this.wallPick.value) ? this.wallPick.value : names.find((n) => n === 'short side') ?? names[0] ?? '';
    this.wallPick.replaceChildren(...names.map((n) => new Option(n, n, false, n === keep)));
    this.drawStations();
    this.drawAreas();
    this.drawWalls();
  }

  /** Station area against distance along the port, the least area ahead of the valve marked; per unit depth in the plane model. */
  private drawAreas(): void {
    const stations = this.reading?.stations ?? [];
    const t = this.reading?.tightest;
    const plane = (this.reading?.model ?? 'plane') === 'plane';
    const unit = plane ? `${this.areaUnits} per ${this.units} of depth` : this.areaUnits;
    this.areaCanvas.title = t ? `Least area ahead of the valve ${Number(t.area.toPrecision(4))} ${unit}, ${t.distanceFromInlet.toFixed(1)} ${this.units} from the inlet.` : '';
    drawPlot(this.areaCanvas, {
      title: plane ? 'Cross-section area (plane model: per unit depth)' : 'Cross-section area along the port (width profile)',
      xLabel: `distance from inlet, ${this.units}`,
      leftLabel: `area, ${unit}`,
      series: [{ label: `area (${this.areaUnits})`, xy: stations.flatMap((s) => [s.distanceFromInlet, s.area]), colour: '#8fd694' }],
      marks: t ? [{ x: t.distanceFromInlet, label: 'least area' }] : [],
    });
  }

  private drawStations(): void {
    const stations = this.reading?.stations ?? [];
    const width = stations.flatMap((s) => [s.distanceFromInlet, s.width]);
    const speed = stations.flatMap((s) => [s.distanceFromInlet, s.meanSpeedRatio]);
    const t = this.reading?.tightest;
    drawPlot(this.stationsCanvas, {
      title: 'Along the port (equipotential stations)',
      xLabel: `distance from inlet, ${this.units}`,
      leftLabel: `width, ${this.units}`,
      rightLabel: 'mean speed ratio',
      series: [
        { label: `width (${this.units})`, xy: width, colour: '#5ec8e5' },
        { label: 'mean speed ratio', xy: speed, colour: '#e8a33d', axis: 'right' },
      ],
      // with a depth the station marked is the one of least area, not always the narrowest in the section
      marks: t ? [{ x: t.distanceFromInlet, label: this.reading?.model === 'plane' ? 'tightest' : 'least area' }] : [],
    });
  }

  private drawWalls(): void {
    const name = this.wallPick.value;
    const wall = this.reading?.walls.find((w) => w.name === name);
    const detachment = this.reading?.detachments.find((d) => d.name === name)?.detachment;
    const series: PlotSeries[] = wall ? [{ label: `${name}`, xy: sAndRatio(wall.samples), colour: WALL_COLOURS[0] }] : [];
    this.wallCaption.textContent = wall
      ? `Peak ${wall.peak.speedRatio.toFixed(2)} at ${wall.peak.s.toFixed(1)} ${this.units} along; falls to ` +
        `${wall.low.speedRatio.toFixed(2)} (${(100 * wall.fall).toFixed(0)}% of the peak), pressure recovered Cp ${wall.pressureRecovered.toFixed(2)}.` +
        (detachment ? ` Flow likely leaves the wall ${detachment.s.toFixed(1)} ${this.units} along (${detachment.method}).` : ' Flow likely stays on the wall.')
      : '';
    drawPlot(this.wallCanvas, {
      title: `Speed ratio along the ${name || 'wall'}`,
      xLabel: `arc length from upstream end, ${this.units}`,
      leftLabel: 'speed ratio',
      series,
      marks: detachment ? [{ x: detachment.s, label: 'leaves wall' }] : [],
    });
  }
}

/** Wall samples (x, y, s, ratio per sample) as (s, ratio) pairs. */
function sAndRatio(samples: Float64Array): Float64Array {
  const out = new Float64Array((samples.length / 4) * 2);
  for (let k = 0, j = 0; k + 3 < samples.length; k += 4, j += 2) {
    out[j] = samples[k + 2];
    out[j + 1] = samples[k + 3];
  }
  return out;
}
