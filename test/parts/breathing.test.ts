/** Breathing numbers from the parts, against src/breathing directly and against Heywood's stage table. */

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Parts, Variant } from '../../src/document/types.ts';
import { loadDocument } from '../../src/document/load.ts';
import {
  crossoverLift, curtainArea, greatestRestriction, liftOverDiameter, minValveFlowArea, netThroatArea, stageBoundaries,
  throatArea, valveHeadArea,
} from '../../src/breathing/index.ts';
import { partsBreathing, ROUND_PORT_NAME, MEASURED_PORT_NAME, SOLVED_PORT_NAME } from '../../src/parts/breathing.ts';
import { breathingSummary } from '../../src/parts/summary.ts';
import { PARTS_40, SEAT_91, VALVE_40, assertInDelta } from './helpers.ts';

const sample = (): Variant =>
  loadDocument(readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8')).variants[0];

describe('breathing numbers of the parts', () => {
  it('match src/breathing called directly in SI, at the valve lift', () => {
    const b = partsBreathing(PARTS_40, 'mm')!;
    const head = { headDiameterM: 0.04, stemDiameterM: 0.007 };
    const cut = { angleDeg: 45, widthM: 0.0015, throatDiameterM: 0.0364 };
    const mm2 = 1e6;
    assertInDelta(b.valveDiameter, 40, 0);
    assertInDelta(b.lift, 8, 0);
    assertInDelta(b.ld, liftOverDiameter(0.008, 0.04), 1e-15);
    assertInDelta(b.headArea, valveHeadArea(head) * mm2, 1e-9);
    assertInDelta(b.throatDiameter, 36.4, 1e-12);
    assertInDelta(b.throatArea, throatArea(cut) * mm2, 1e-9);
    assertInDelta(b.throatNetArea, netThroatArea(head, cut) * mm2, 1e-9);
    assertInDelta(b.throatPct, 91, 1e-12);
    assertInDelta(b.curtainArea, curtainArea(0.04, 0.008) * mm2, 1e-9);
    const flow = minValveFlowArea(0.008, head, cut);
    assertInDelta(b.minValveArea, flow.areaM2 * mm2, 1e-9);
    expect(b.stage).toBe(flow.stage);
    const stages = stageBoundaries(head, cut);
    assertInDelta(b.stage3StartLift, stages.stage3StartM * 1e3, 1e-12);
    const ranking = greatestRestriction(0.008, head, cut);
    expect(b.ranking.map((r) => r.name)).toEqual(ranking.map((r) => r.name));
    expect(b.greatest).toBe(ranking[0].name);
    assertInDelta(b.crossoverLift!, crossoverLift(head, cut, {}, { fromM: 0, toM: 2 * stages.stage3StartM })! * 1e3, 1e-12);
  });

  it('give pi D L for the curtain, equal to the head area at L/D 0.25', () => {
    // REFERENCES.md 3a [derived]: A_c = pi D L; at L/D = 0.25 it equals pi D^2 / 4.
    const b = partsBreathing(PARTS_40, 'mm', { lift: 10 })!;
    assertInDelta(b.curtainArea, Math.PI * 40 * 10, 1e-9);
    assertInDelta(b.curtainArea, b.headArea, 1e-9);
  });

  it("reproduce Heywood's conical-seat stage table through the parts (40 valve, 1.5 seat, 34 throat, 7 stem)", () => {
    // REFERENCES.md 3a [derived from Heywood 1988, sec. 6.3.1]: D_v 40, w 1.5, D_p 34, D_s 7 mm.
    const parts = (angle: number): Parts => ({ valve: { ...VALVE_40, seatAngleDeg: angle }, seat: { ...SEAT_91, throatPct: 85 } });
    const at = (angle: number, lift: number) => partsBreathing(parts(angle), 'mm', { lift })!.minValveArea;
    assertInDelta(at(45, 1), 83.304, 5e-4);
    assertInDelta(at(45, 2), 168.830, 5e-4);
    assertInDelta(at(45, 5), 460.569, 5e-4);
    assertInDelta(at(45, 8), 806.846, 5e-4);
    assertInDelta(at(45, 12), 869.436, 5e-4);
    assertInDelta(at(30, 1), 101.844, 5e-4);
    assertInDelta(at(30, 2), 206.044, 5e-4);
    assertInDelta(at(30, 5), 531.907, 5e-4);
    assertInDelta(partsBreathing(parts(45), 'mm')!.stage3StartLift, 8.5301, 5e-5);
    assertInDelta(partsBreathing(parts(30), 'mm')!.stage1EndLift, 3.4641, 5e-5);
  });

  it('give the same physics in inches: lengths in inches, areas in square inches', () => {
    const inch = 25.4;
    const inParts: Parts = {
      valve: { ...VALVE_40, diameter: 40 / inch, seatFaceWidth: 2.5 / inch, stemDiameter: 7 / inch, lift: 8 / inch },
      seat: { ...SEAT_91, seatWidth: 1.5 / inch },
    };
    const mm = partsBreathing(PARTS_40, 'mm')!, ins = partsBreathing(inParts, 'inch')!;
    assertInDelta(ins.minValveArea * inch * inch, mm.minValveArea, 1e-9);
    assertInDelta(ins.curtainArea * inch * inch, mm.curtainArea, 1e-9);
    assertInDelta(ins.crossoverLift! * inch, mm.crossoverLift!, 1e-6);
    assertInDelta(ins.ld, mm.ld, 1e-15);
  });

  it('rank a measured port area, or a round port of the tightest width labelled as an assumption', () => {
    const measured = partsBreathing({ ...PARTS_40, port: { tightestArea: 700 } }, 'mm', { lift: 12, tightestWidth: 50 })!;
    expect(measured.port).toEqual({ name: MEASURED_PORT_NAME, area: 700, source: 'measured' });
    expect(measured.greatest).toBe(MEASURED_PORT_NAME);
    const assumed = partsBreathing(PARTS_40, 'mm', { tightestWidth: 30 })!;
    expect(assumed.port).toEqual({ name: ROUND_PORT_NAME, area: (Math.PI / 4) * 900, source: 'round-port assumption' });
    expect(assumed.ranking.map((r) => r.name)).toContain(ROUND_PORT_NAME);
    expect(partsBreathing(PARTS_40, 'mm')!.port).toBeNull();
    expect(partsBreathing({ valve: VALVE_40 }, 'mm')).toBeNull();
  });

  it('rank the least area solved under a width profile before a measured area, and say so', () => {
    const solved = partsBreathing({ ...PARTS_40, port: { tightestArea: 2000 } }, 'mm', { lift: 12, solvedLeastArea: 700 })!;
    expect(solved.port).toEqual({ name: SOLVED_PORT_NAME, area: 700, source: 'solved least area of the width profile' });
    expect(solved.greatest).toBe(SOLVED_PORT_NAME);
    expect(solved.ranking.map((r) => r.name)).not.toContain(MEASURED_PORT_NAME);
    // the same number typed as a measured area ranks the same: only the name and source differ
    const typed = partsBreathing({ ...PARTS_40, port: { tightestArea: 700 } }, 'mm', { lift: 12 })!;
    expect(solved.crossoverLift).toBe(typed.crossoverLift);
    const summary = breathingSummary({ name: 'v', section: sample().section, parts: PARTS_40 }, 'mm', { solvedLeastArea: 700 })!;
    expect(summary.port).toEqual(solved.port);
    expect(summary.greatest).toBe(partsBreathing(PARTS_40, 'mm', { solvedLeastArea: 700 })!.greatest);
  });

  it('find the lift where the greatest restriction leaves the valve: the valve area equals the port side there', () => {
    const port = { tightestArea: 800 };
    const b = partsBreathing({ ...PARTS_40, port }, 'mm')!;
    const at = (lift: number) => partsBreathing({ ...PARTS_40, port }, 'mm', { lift })!;
    // The lift is found by bisection to 0.1 um; the valve area climbs about 120 mm^2 per mm there.
    assertInDelta(at(b.crossoverLift!).minValveArea, 800, 0.02);
    expect(at(b.crossoverLift! - 0.01).greatest).toBe('valve');
    expect(at(b.crossoverLift! + 0.01).greatest).toBe(MEASURED_PORT_NAME);
  });
});

describe('the street samples', () => {
  it('have a crossover lift: the valve restricts at 10 mm, the throat takes over where stage 3 starts', () => {
    const b = partsBreathing(sample().parts!, 'mm')!;
    expect(b.greatest).toBe('valve');
    expect(b.stage).toBe(2);
    expect(b.crossoverLift).not.toBeNull();
    // With no port area known the port side is the throat, which the valve area meets as stage 3 starts
    // (the stages join without a jump: REFERENCES.md 3a).
    assertInDelta(b.crossoverLift!, b.stage3StartLift, 1e-4);
    expect(b.crossoverLift!).toBeGreaterThan(10);
    console.log(`sample at 10 mm: min valve area ${b.minValveArea.toFixed(1)} mm^2 (stage ${b.stage}), curtain ${b.curtainArea.toFixed(1)}, throat ${b.throatArea.toFixed(1)} gross / ${b.throatNetArea.toFixed(1)} net; crossover ${b.crossoverLift!.toFixed(3)} mm`);
  });

  it('summarise for solve --json in the document units, as plain JSON', () => {
    const summary = breathingSummary(sample(), 'mm')!;
    expect(Object.keys(summary)).toEqual(['valveDiameter', 'lift', 'ld', 'curtainArea', 'minValveArea', 'stage', 'throatArea', 'throatPct', 'port', 'greatest', 'crossoverLift']);
    expect(summary.port).toBeNull();
    expect(JSON.parse(JSON.stringify(summary))).toEqual(summary);
    expect(summary.valveDiameter).toBe(46);
    expect(summary.lift).toBe(10);
    assertInDelta(summary.ld, 10 / 46, 1e-15);
    assertInDelta(summary.curtainArea, Math.PI * 46 * 10, 1e-9);
    assertInDelta(summary.throatPct, 91, 1e-12);
    assertInDelta(summary.throatArea, (Math.PI / 4) * (0.91 * 46) ** 2, 1e-9);
    expect(breathingSummary({ name: 'bare', section: sample().section }, 'mm')).toBeNull();
  });
});
