/**
 * Where things lie along the port for the plan-view strip: a point of the section mapped to its distance from the
 * manifold face along the path through the reading's station centroids (the path Station.distanceFromInlet follows).
 */
import type { ValvePart, WidthObstruction } from '../../document/types.ts';

/** What the mapping needs of a station: its centroid and its distance along, document units. */
export interface StationMark {
  readonly midX: number;
  readonly midY: number;
  readonly distanceFromInlet: number;
}

/**
 * Distance along the port of the point (x, y): its projection onto the polyline of station centroids, measured
 * as that polyline measures (a point ahead of the first centroid projects onto the first leg, held at 0 or more).
 * Null when there are no stations. A sketch for drawing: the study's own mapping goes through the potential.
 */
export function alongOfPoint(stations: readonly StationMark[], x: number, y: number): number | null {
  if (stations.length === 0) return null;
  if (stations.length === 1) return stations[0].distanceFromInlet;
  let best = Infinity;
  let along = 0;
  for (let k = 0; k + 1 < stations.length; k++) {
    const a = stations[k], b = stations[k + 1];
    const dx = b.midX - a.midX, dy = b.midY - a.midY;
    const length2 = dx * dx + dy * dy;
    const first = k === 0, last = k + 2 === stations.length;
    let t = length2 > 0 ? ((x - a.midX) * dx + (y - a.midY) * dy) / length2 : 0;
    // The end legs reach past their ends, so a point beyond the last centroid still finds a distance.
    t = Math.min(last ? Infinity : 1, Math.max(first ? -Infinity : 0, t));
    const d = Math.hypot(a.midX + t * dx - x, a.midY + t * dy - y);
    if (d < best) {
      best = d;
      along = a.distanceFromInlet + t * (b.distanceFromInlet - a.distanceFromInlet);
    }
  }
  return Math.max(0, along);
}

/** The point `s` document units up the valve axis from the gauge-line centre (up is against the opening direction). */
export function pointUpAxis(valve: ValvePart, s: number): [number, number] {
  const lean = (valve.axis.inclinationDeg * Math.PI) / 180;
  // Opening direction: straight down turned counter-clockwise by the lean, (sin, -cos); up is its opposite.
  return [valve.axis.x - s * Math.sin(lean), valve.axis.y + s * Math.cos(lean)];
}

/** An obstruction as the strip draws it: the along-port stretch its stretch of valve axis covers. */
export interface ObstructionSpan {
  readonly name: string;
  /** Document units. */
  readonly diameter: number;
  /** Distance along the port, document units, start < end. */
  readonly start: number;
  readonly end: number;
}

/** Each obstruction's stretch along the port (its axis ends mapped, widened by its radius), or [] without a valve or stations. */
export function obstructionSpans(
  obstructions: readonly WidthObstruction[], valve: ValvePart | undefined, stations: readonly StationMark[],
): ObstructionSpan[] {
  if (!valve) return [];
  const spans: ObstructionSpan[] = [];
  for (const o of obstructions) {
    const a = alongOfPoint(stations, ...pointUpAxis(valve, o.from));
    const b = alongOfPoint(stations, ...pointUpAxis(valve, o.to));
    if (a === null || b === null) continue;
    spans.push({ name: o.name, diameter: o.diameter, start: Math.max(0, Math.min(a, b) - o.diameter / 2), end: Math.max(a, b) + o.diameter / 2 });
  }
  return spans;
}

/** Distance along the port of the seat (the gauge-line centre), or null without a valve or stations. */
export function seatAlong(valve: ValvePart | undefined, stations: readonly StationMark[]): number | null {
  return valve ? alongOfPoint(stations, valve.axis.x, valve.axis.y) : null;
}
