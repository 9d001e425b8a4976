/** A set of polylines drawn with a fixed width in CSS px (three.js fat lines), one style per layer. */

import { Color } from 'three';
import { LineMaterial } from 'three/examples/jsm/lines/LineMaterial.js';
import { LineSegments2 } from 'three/examples/jsm/lines/LineSegments2.js';
import { LineSegmentsGeometry } from 'three/examples/jsm/lines/LineSegmentsGeometry.js';
import type { LineStyle } from './view-style.ts';

/** Any flat x, y polyline. */
export interface FlatLine {
  readonly xy: ArrayLike<number>;
  readonly closed?: boolean;
}

/**
 * Segment end points of the polylines as x, y, z triples (z = 0), two points per segment: the layout
 * LineSegmentsGeometry.setPositions expects.
 */
export function segmentPositions(lines: readonly FlatLine[]): Float32Array {
  let segments = 0;
  for (const l of lines) {
    const n = l.xy.length / 2;
    if (n >= 2) segments += l.closed ? n : n - 1;
  }
  const out = new Float32Array(segments * 6);
  let o = 0;
  for (const l of lines) {
    const n = l.xy.length / 2;
    if (n < 2) continue;
    const count = l.closed ? n : n - 1;
    for (let k = 0; k < count; k++) {
      const b = (k + 1) % n;
      out[o++] = l.xy[2 * k];
      out[o++] = l.xy[2 * k + 1];
      out[o++] = 0;
      out[o++] = l.xy[2 * b];
      out[o++] = l.xy[2 * b + 1];
      out[o++] = 0;
    }
  }
  return out;
}

export class LineLayer {
  readonly object: LineSegments2;
  private readonly material: LineMaterial;
  private readonly style: LineStyle;

  constructor(style: LineStyle, renderOrder: number) {
    this.style = style;
    this.material = new LineMaterial({
      color: new Color(style.colour),
      linewidth: style.widthPx,
      worldUnits: false,
      transparent: true,
      opacity: style.opacity,
      depthTest: false,
      depthWrite: false,
      dashed: style.dashPx !== undefined,
    });
    this.object = new LineSegments2(new LineSegmentsGeometry(), this.material);
    this.object.renderOrder = renderOrder;
    this.object.frustumCulled = false;
    this.object.visible = false;
  }

  /** Replace the lines; the old geometry's GPU buffers are freed. Clearing an empty layer costs nothing, since the
   * app clears contours, streamlines and flags on every drag step. */
  setLines(lines: readonly FlatLine[]): void {
    const positions = segmentPositions(lines);
    if (positions.length === 0 && !this.object.visible) return;
    this.object.geometry.dispose();
    const geometry = new LineSegmentsGeometry();
    if (positions.length > 0) geometry.setPositions(positions);
    this.object.geometry = geometry;
    this.object.visible = positions.length > 0;
    if (this.style.dashPx && positions.length > 0) this.object.computeLineDistances();
  }

  /** Dash lengths live in section units in the material; rescale them so dashes keep their CSS px size. */
  setScale(pxPerUnit: number): void {
    if (!this.style.dashPx) return;
    this.material.dashSize = this.style.dashPx[0] / pxPerUnit;
    this.material.gapSize = this.style.dashPx[1] / pxPerUnit;
  }

  dispose(): void {
    this.object.geometry.dispose();
    this.material.dispose();
  }
}
