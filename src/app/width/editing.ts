/**
 * Wires the width table and the plan-view strip to the document store: typed values are edits, a strip drag is one
 * undo step (drag steps, then endDrag), and both show the active variant's profile after every change.
 */
import { lengthLabel } from '../../breathing/units.ts';
import type { PortDocument, WidthProfile } from '../../document/types.ts';
import { activeVariant } from '../../editor/index.ts';
import { monotoneCubic } from '../../study/monotone-cubic.ts';
import { WidthStrip, type StripPicture } from '../../view/width-strip.ts';
import type { DocumentStore } from '../document-store.ts';
import { plainMessage } from '../document-check.ts';
import { obstructionSpans, seatAlong, type StationMark } from './along.ts';
import { modelWords, WidthPanel } from './panel.ts';
import { dragStation, typicalPortWidth } from './table.ts';

export interface WidthEditingHosts {
  readonly panel: HTMLElement;
  readonly strip: HTMLElement;
}

export interface WidthEditing {
  /** A full solve's stations (their centroids and distances place the seat and the obstructions along the port). */
  solved(stations: readonly StationMark[]): void;
  readonly strip: WidthStrip;
}

/** Points drawn along the strip's outline. */
const OUTLINE_SAMPLES = 160;

export function mountWidthEditing(
  hosts: WidthEditingHosts, store: DocumentStore, say: (message: string, level: 'info' | 'error') => void,
): WidthEditing {
  let stations: readonly StationMark[] = [];
  const send = (profile: WidthProfile | null, cause: 'edit' | 'drag'): boolean => {
    try {
      store.edit('setWidthProfile', { width: profile }, cause);
      return true;
    } catch (error) {
      say(plainMessage(error), cause === 'drag' ? 'info' : 'error');
      return false;
    }
  };
  const panel = new WidthPanel(hosts.panel, {
    send: (profile) => send(profile, 'edit'),
    refuse: (message) => say(message, 'error'),
    seatAlong: () => seatAlong(activeVariant(store.doc).parts?.valve, stations),
  });
  const strip = new WidthStrip(hosts.strip, {
    onDrag: (index, along, width) => {
      const profile = activeVariant(store.doc).width;
      if (!profile) return;
      // Never narrower than 2% of a typical port: a handle pulled onto the centre line keeps a passage.
      send(dragStation(profile, index, along, width, 0.02 * typicalPortWidth(store.doc.units)), 'drag');
    },
    onRelease: () => store.endDrag(),
    onCancel: () => store.cancelDrag(),
  });
  const showStrip = (doc: PortDocument) => strip.show(stripPicture(doc, stations));
  store.subscribe((doc, cause) => {
    showStrip(doc);
    if (cause !== 'drag') panel.show(doc);
  });
  panel.show(store.doc);
  showStrip(store.doc);
  return {
    solved(next) {
      stations = next;
      if (!strip.dragging) showStrip(store.doc);
    },
    strip,
  };
}

/** What the strip draws for the active variant, or null (hidden) when it has no width profile. */
export function stripPicture(doc: PortDocument, stations: readonly StationMark[]): StripPicture | null {
  const variant = activeVariant(doc);
  const profile = variant.width;
  if (!profile) return null;
  const valve = variant.parts?.valve;
  const seat = seatAlong(valve, stations);
  const lastStation = profile.stations[profile.stations.length - 1].along;
  const alongMax = 1.08 * Math.max(lastStation, seat ?? 0) || 1;
  // The solve's own interpolation (monotone cubic, held beyond the end stations), so the strip draws what is solved.
  const widthAt = monotoneCubic(profile.stations.map((s) => s.along), profile.stations.map((s) => s.width));
  const outline = new Float64Array(2 * (OUTLINE_SAMPLES + 1));
  for (let k = 0; k <= OUTLINE_SAMPLES; k++) {
    const along = (alongMax * k) / OUTLINE_SAMPLES;
    outline[2 * k] = along;
    outline[2 * k + 1] = widthAt(along);
  }
  return {
    title: `Plan view, ${modelWords(profile)}`,
    unitLabel: lengthLabel(doc.units),
    outline,
    stations: profile.stations,
    notches: obstructionSpans(profile.obstructions ?? [], valve, stations),
    marks: seat === null ? [] : [{ along: seat, label: 'seat' }],
    alongMax,
  };
}
