/** What the plan-view strip is given: nothing without a profile; with one, the outline, handles, seat and notches. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { stripPicture } from '../../../src/app/width/editing.ts';
import { loadDocument } from '../../../src/document/load.ts';
import type { PortDocument, WidthProfile } from '../../../src/document/types.ts';
import { applyEdit, activeVariant } from '../../../src/editor/index.ts';

const SAMPLE = loadDocument(readFileSync(new URL('../../../samples/short-side-compare.json', import.meta.url), 'utf8'));
const valve = activeVariant(SAMPLE).parts?.valve;
/** A straight path of stations along +x through the valve axis point: along = x - (axis x - 100) [derived]. */
const ax = valve?.axis.x ?? 0, ay = valve?.axis.y ?? 0;
const path = [0, 50, 100, 150].map((d) => ({ midX: ax - 100 + d, midY: ay, distanceFromInlet: d }));

const withProfile = (profile: WidthProfile): PortDocument => applyEdit(SAMPLE, 'setWidthProfile', { width: profile });

describe('stripPicture', () => {
  it('is null (the strip hidden) when the active variant has no width profile', () => {
    expect(activeVariant(SAMPLE).width).toBeUndefined();
    expect(stripPicture(SAMPLE, path)).toBeNull();
  });

  it('names the model, draws the width held at the ends and straight between two stations (the monotone cubic through two points), and marks the seat', () => {
    const doc = withProfile({ stations: [{ along: 10, width: 30 }, { along: 60, width: 50 }] });
    const picture = stripPicture(doc, path);
    expect(picture?.title).toBe('Plan view, width profile (width-weighted flow)');
    expect(picture?.marks).toEqual([{ along: 100, label: 'seat' }]);
    expect(picture?.alongMax).toBeCloseTo(108, 9);
    const outline = Array.from(picture?.outline ?? []);
    expect(outline[1]).toBe(30);
    expect(outline[outline.length - 1]).toBe(50);
    const k = outline.findIndex((v, i) => i % 2 === 0 && v >= 35);
    expect(outline[k + 1]).toBeCloseTo(30 + (20 * (outline[k] - 10)) / 50, 9);
  });

  it('draws an obstruction over the stretch of port its stretch of valve axis crosses', () => {
    if (!valve) throw new Error('the sample has a valve');
    const doc = withProfile({ stations: [{ along: 0, width: 32 }, { along: 100, width: 32 }], obstructions: [{ name: 'valve stem', diameter: 8, from: 0, to: 20 }] });
    const [notch] = stripPicture(doc, path)?.notches ?? [];
    expect(notch.name).toBe('valve stem');
    expect(notch.diameter).toBe(8);
    // On this straight path a point's distance along is its x; up the axis moves x by -s sin(lean).
    const lean = (valve.axis.inclinationDeg * Math.PI) / 180;
    const xs = [0, 20].map((s) => 100 - s * Math.sin(lean));
    expect(notch.start).toBeCloseTo(Math.min(...xs) - 4, 9);
    expect(notch.end).toBeCloseTo(Math.max(...xs) + 4, 9);
  });
});
