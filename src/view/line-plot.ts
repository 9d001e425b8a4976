/** A small 2D-canvas line plot for the side panel: wall speed against arc length, station width and speed along the port. */

export interface PlotSeries {
  readonly label: string;
  /** x0, y0, x1, y1, ... in plot units. */
  readonly xy: ArrayLike<number>;
  readonly colour: string;
  /** Which vertical axis the series uses. */
  readonly axis?: 'left' | 'right';
}

export interface PlotSpec {
  readonly title: string;
  readonly xLabel: string;
  readonly leftLabel: string;
  readonly rightLabel?: string;
  readonly series: readonly PlotSeries[];
  /** Vertical marks, e.g. a detachment point, in x units. */
  readonly marks?: readonly { readonly x: number; readonly label: string }[];
}

/** Title on the first line, legend on the second, then the plot. */
const PAD = { left: 40, right: 40, top: 34, bottom: 30 };

export function drawPlot(canvas: HTMLCanvasElement, spec: PlotSpec): void {
  const ratio = window.devicePixelRatio || 1;
  const width = canvas.clientWidth || 300;
  const height = canvas.clientHeight || 160;
  canvas.width = Math.round(width * ratio);
  canvas.height = Math.round(height * ratio);
  const g = canvas.getContext('2d', { willReadFrequently: true });
  if (!g) return;
  g.setTransform(ratio, 0, 0, ratio, 0, 0);
  g.clearRect(0, 0, width, height);
  g.font = '11px system-ui, sans-serif';
  g.fillStyle = '#e3e6ea';
  g.fillText(spec.title, PAD.left, 13);
  const xr = rangeOf(spec.series, 0);
  const left = rangeOf(spec.series.filter((s) => s.axis !== 'right'), 1, true);
  const right = rangeOf(spec.series.filter((s) => s.axis === 'right'), 1, true);
  const px = (x: number) => PAD.left + ((x - xr.min) / (xr.max - xr.min || 1)) * (width - PAD.left - PAD.right);
  const py = (y: number, r: Range) => height - PAD.bottom - ((y - r.min) / (r.max - r.min || 1)) * (height - PAD.top - PAD.bottom);
  drawAxes(g, width, height, xr, left, spec.rightLabel ? right : null, spec);
  for (const s of spec.series) {
    const r = s.axis === 'right' ? right : left;
    g.strokeStyle = s.colour;
    g.lineWidth = 1.5;
    g.beginPath();
    let pen = false;
    for (let k = 0; k + 1 < s.xy.length; k += 2) {
      const x = s.xy[k];
      const y = s.xy[k + 1];
      if (!Number.isFinite(x) || !Number.isFinite(y)) { pen = false; continue; }
      if (pen) g.lineTo(px(x), py(y, r)); else g.moveTo(px(x), py(y, r));
      pen = true;
    }
    g.stroke();
  }
  for (const m of spec.marks ?? []) {
    g.strokeStyle = '#ff7a6b';
    g.setLineDash([3, 3]);
    g.beginPath();
    g.moveTo(px(m.x), PAD.top);
    g.lineTo(px(m.x), height - PAD.bottom);
    g.stroke();
    g.setLineDash([]);
    g.fillStyle = '#ff7a6b';
    g.fillText(m.label, px(m.x) + 3, PAD.top + 10);
  }
  drawLegend(g, spec.series, width);
}

interface Range { min: number; max: number }

function rangeOf(series: readonly PlotSeries[], offset: 0 | 1, fromZero = false): Range {
  let min = fromZero ? 0 : Infinity;
  let max = -Infinity;
  for (const s of series) for (let k = offset; k < s.xy.length; k += 2) {
    const v = s.xy[k];
    if (Number.isFinite(v)) { min = Math.min(min, v); max = Math.max(max, v); }
  }
  return Number.isFinite(max) ? { min, max: max === min ? min + 1 : max } : { min: 0, max: 1 };
}

function drawAxes(g: CanvasRenderingContext2D, w: number, h: number, xr: Range, left: Range, right: Range | null, spec: PlotSpec): void {
  g.strokeStyle = '#2e343d';
  g.strokeRect(PAD.left, PAD.top, w - PAD.left - PAD.right, h - PAD.top - PAD.bottom);
  g.fillStyle = '#9aa3ad';
  g.fillText(fmt(xr.min), PAD.left, h - PAD.bottom + 12);
  g.fillText(fmt(xr.max), w - PAD.right - 24, h - PAD.bottom + 12);
  g.fillText(spec.xLabel, w / 2 - 30, h - 4);
  g.fillText(fmt(left.max), 4, PAD.top + 8);
  g.fillText(fmt(left.min), 4, h - PAD.bottom);
  if (right) {
    g.fillText(fmt(right.max), w - PAD.right + 4, PAD.top + 8);
    g.fillText(fmt(right.min), w - PAD.right + 4, h - PAD.bottom);
  }
}

function drawLegend(g: CanvasRenderingContext2D, series: readonly PlotSeries[], w: number): void {
  let x = w - PAD.right + 30;
  for (const s of [...series].reverse()) {
    const text = s.label;
    x -= g.measureText(text).width + 18;
    g.fillStyle = s.colour;
    g.fillRect(x, 21, 10, 3);
    g.fillStyle = '#e3e6ea';
    g.fillText(text, x + 13, 26);
  }
}

function fmt(v: number): string {
  return Math.abs(v) >= 100 ? v.toFixed(0) : Math.abs(v) >= 10 ? v.toFixed(1) : v.toFixed(2);
}
