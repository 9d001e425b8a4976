import { describe, expect, it } from 'vitest';
import { BreathingInputError } from '../../src/breathing/errors.ts';
import {
  curtainArea,
  liftOverDiameter,
  minValveFlowArea,
  netThroatArea,
  stageBoundaries,
  throatForPercent,
  throatPercent,
  valveHeadArea,
} from '../../src/breathing/valve.ts';
import { expectRoundsTo } from './close.ts';
import { mm, mm2, seatAt, valve } from './valve-fixture.ts';

// Check table: REFERENCES.md 3a [derived] from Heywood, Internal Combustion Engine Fundamentals, 1988, sec. 6.3.1.
describe('Heywood three-stage minimum flow area, D_v 40, w 1.5, D_p 34, D_s 7 mm', () => {
  const cases: { angle: number; stage1End: number; stage3Start: number; rows: [number, number, 1 | 2 | 3][] }[] = [
    {
      angle: 45,
      stage1End: 3.0,
      stage3Start: 8.5301,
      rows: [
        [1, 83.304, 1],
        [2, 168.83, 1],
        [5, 460.569, 2],
        [8, 806.846, 2],
      ],
    },
    {
      angle: 30,
      stage1End: 3.4641,
      stage3Start: 7.8961,
      rows: [
        [1, 101.844, 1],
        [2, 206.044, 1],
        [5, 531.907, 2],
      ],
    },
  ];
  for (const c of cases) {
    it(`${c.angle} deg: stage boundaries`, () => {
      const b = stageBoundaries(valve, seatAt(c.angle));
      expectRoundsTo(b.stage1EndM / mm, c.stage1End, c.angle === 45 ? 3 : 4);
      expectRoundsTo(b.stage3StartM / mm, c.stage3Start, 4);
    });
    it(`${c.angle} deg: areas at L = 1, 2, 5 (8) mm`, () => {
      for (const [liftMm, areaMm2, stage] of c.rows) {
        const a = minValveFlowArea(liftMm * mm, valve, seatAt(c.angle));
        expectRoundsTo(a.areaM2 / mm2, areaMm2, 3);
        expect(a.stage).toBe(stage);
      }
    });
    it(`${c.angle} deg: full open is the net throat, 869.436 mm^2`, () => {
      for (const liftMm of [c.stage3Start + 0.01, 12, 20]) {
        const a = minValveFlowArea(liftMm * mm, valve, seatAt(c.angle));
        expect(a.stage).toBe(3);
        expectRoundsTo(a.areaM2 / mm2, 869.436, 3);
      }
      expectRoundsTo(netThroatArea(valve, seatAt(c.angle)) / mm2, 869.436, 3);
    });
    it(`${c.angle} deg: the stages join without a jump`, () => {
      const seat = seatAt(c.angle);
      const b = stageBoundaries(valve, seat);
      for (const L of [b.stage1EndM, b.stage3StartM]) {
        const below = minValveFlowArea(L * (1 - 1e-9), valve, seat);
        const above = minValveFlowArea(L * (1 + 1e-9), valve, seat);
        expect(above.stage).toBe(below.stage + 1);
        expect(Math.abs(above.areaM2 - below.areaM2) / above.areaM2).toBeLessThan(1e-7);
      }
    });
  }

  it('never falls as lift rises (so the crossover search has one answer)', () => {
    let last = 0;
    for (let i = 0; i <= 400; i++) {
      const a = minValveFlowArea(i * 0.05 * mm, valve, seatAt(45)).areaM2;
      expect(a).toBeGreaterThanOrEqual(last);
      last = a;
    }
  });

  it('a throat too small for stage 2 goes from stage 1 straight to stage 3, still without a jump', () => {
    const tight = seatAt(45, 16 * mm);
    const b = stageBoundaries(valve, tight);
    expect(b.stage1EndM).toBe(b.stage3StartM);
    const below = minValveFlowArea(b.stage3StartM * (1 - 1e-9), valve, tight);
    const above = minValveFlowArea(b.stage3StartM * (1 + 1e-9), valve, tight);
    expect([below.stage, above.stage]).toEqual([1, 3]);
    expect(Math.abs(above.areaM2 - below.areaM2) / above.areaM2).toBeLessThan(1e-7);
  });
});

describe('areas and ratios', () => {
  it('curtain area at L/D = 0.25 equals the valve head area [derived; Heywood 1988 sec. 6.3, memory]', () => {
    const lift = 0.25 * valve.headDiameterM;
    expect(liftOverDiameter(lift, valve.headDiameterM)).toBeCloseTo(0.25, 15);
    expect(curtainArea(valve.headDiameterM, lift)).toBeCloseTo(valveHeadArea(valve), 15);
    expectRoundsTo(valveHeadArea(valve) / mm2, 1256.637, 3); // pi * 40^2 / 4 [derived]
  });

  it('a 91 % throat on a 40 mm valve is 36.4 mm (REFERENCES.md 3a, common practice)', () => {
    const throat = throatForPercent(40 * mm, 91);
    expectRoundsTo(throat / mm, 36.4, 9);
    expectRoundsTo(throatPercent(valve, { ...seatAt(45), throatDiameterM: throat }), 91, 9);
  });

  it('rejects a valve and seat that cannot exist, with a message a porter understands', () => {
    const bad = [
      () => minValveFlowArea(-1 * mm, valve, seatAt(45)),
      () => minValveFlowArea(1 * mm, valve, seatAt(0)),
      () => minValveFlowArea(1 * mm, valve, seatAt(90)),
      () => minValveFlowArea(1 * mm, valve, { ...seatAt(45), widthM: 20 * mm }),
      () => minValveFlowArea(1 * mm, { ...valve, stemDiameterM: 35 * mm }, seatAt(45)),
      () => minValveFlowArea(1 * mm, { ...valve, headDiameterM: Number.NaN }, seatAt(45)),
    ];
    for (const call of bad) expect(call).toThrow(BreathingInputError);
    expect(() => minValveFlowArea(-1 * mm, valve, seatAt(45))).toThrow(/Valve lift cannot be negative/);
  });
});
