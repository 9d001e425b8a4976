/** A JSON-ready digest of a flow reading, for the headless command's --json output. */
import type { DetachmentMethod, FlowReading, PassageModel } from './types.ts';

/** Plain numbers and strings only; every number rounded to six significant figures so that output is stable. */
export interface ReadingSummary {
  /** 'plane' (per unit depth) or the passage depth the flow was solved with */
  readonly model: PassageModel;
  /** area: the depth integrated across the station, document units squared (the width times 1 in the plane model) */
  readonly stations: { phi: number; width: number; area: number; meanSpeedRatio: number; distanceFromInlet: number }[];
  readonly tightest: { width: number; x1: number; y1: number; x2: number; y2: number; distanceFromInlet: number } | null;
  /** The station of least area ahead of the valve (the tightest), its area (document units squared) and span ends. */
  readonly leastArea: { area: number; x1: number; y1: number; x2: number; y2: number } | null;
  /** Depth integrated over the port and bowl above the deck, document units cubed (squared in the plane model). */
  readonly portVolume: number;
  /** slow share of the judged section: all of it, or the part above the deck when the reading was given one */
  readonly slowShare: number;
  /** slow share of the port ahead of the valve */
  readonly portSlowShare: number;
  readonly walls: {
    name: string;
    /** undefined when the wall has no reading (no sample with a speed) */
    peakSpeedRatio: number | undefined;
    pressureRecovered: number | undefined;
    detachment: { s: number; x: number; y: number; method: DetachmentMethod; shapeFactor: number } | null;
  }[];
  readonly findings: string[];
}

/** The summary of `reading` (lengths in document units, s from each wall's upstream end). */
export function readingSummary(reading: FlowReading): ReadingSummary {
  const t = reading.tightest;
  return {
    model: reading.model,
    stations: reading.stations.map((s) => ({
      phi: round(s.phi), width: round(s.width), area: round(s.area), meanSpeedRatio: round(s.meanSpeedRatio), distanceFromInlet: round(s.distanceFromInlet),
    })),
    tightest: t ? { width: round(t.width), x1: round(t.x1), y1: round(t.y1), x2: round(t.x2), y2: round(t.y2), distanceFromInlet: round(t.distanceFromInlet) } : null,
    leastArea: t ? { area: round(t.area), x1: round(t.x1), y1: round(t.y1), x2: round(t.x2), y2: round(t.y2) } : null,
    portVolume: round(reading.portVolume),
    slowShare: round(reading.slow.share),
    portSlowShare: round(reading.slow.portShare),
    walls: reading.detachments.map((d) => {
      const wall = reading.walls.find((w) => w.name === d.name);
      const at = d.detachment;
      return {
        name: d.name,
        peakSpeedRatio: wall ? round(wall.peak.speedRatio) : undefined,
        pressureRecovered: wall ? round(wall.pressureRecovered) : undefined,
        detachment: at ? { s: round(at.s), x: round(at.x), y: round(at.y), method: at.method, shapeFactor: round(at.shapeFactor) } : null,
      };
    }),
    findings: reading.findings.map((f) => f.text),
  };
}

/** Six significant figures; NaN would be a fault upstream and passes through for the writer to refuse. */
function round(value: number): number {
  return Number.isFinite(value) ? Number(value.toPrecision(6)) : NaN;
}
