/** The generated seat rings, measured back from the outline they produce (not from the numbers that made them). */

import { describe, expect, it } from 'vitest';
import type { Outline, Parts, Point, SeatPart, ValvePart } from '../../src/document/types.ts';
import { applyParts } from '../../src/parts/apply.ts';
import { PartsError } from '../../src/parts/errors.ts';
import { anchorIndices } from '../../src/parts/anchors.ts';
import { BORE_80, SEAT_91, VALVE_40, angleTo, assertInDelta, distanceToLine, handDrawnPort, length, runFromAnchor, unit, type Run } from './helpers.ts';

/**
 * The two rings of a generated pocket, each from the throat down: throat, bottom cut, seat face, top cut. The port
 * (handDrawnPort, not mirrored) has its manifold on the left, where the pocket starts: that ring is the short side's.
 */
function rings(outline: Outline): { left: Run[]; right: Run[]; axisDir: Point } {
  const run = runFromAnchor(outline, anchorIndices(outline)[0]);
  const isDeck = (r: Run) => r.name?.startsWith('deck') ?? false;
  const down = run.slice(0, run.findIndex(isDeck));
  const upEnd = run.length - 1 - [...run].reverse().findIndex(isDeck);
  const up = run.slice(upEnd + 1).reverse().map((r) => ({ ...r, a: r.b, b: r.a }));
  const pick = (ring: Run[]) => ring.filter((r) => /^(throat|seat) /.test(r.name ?? ''));
  const a = pick(down), b = pick(up);
  const ringNames = (side: string) => [`throat ${side}`, `seat ${side}`, `seat ${side}`, `seat ${side}`];
  expect(a.map((r) => r.name)).toEqual(ringNames('(short side)'));
  expect(b.map((r) => r.name)).toEqual(ringNames('(long side)'));
  // The throat walls run along the valve axis: their direction is the axis, read from the outline itself.
  const axisDir = unit(a[0]);
  assertInDelta(angleTo(b[0], axisDir), 0, 1e-9);
  return a[0].a[0] < b[0].a[0] ? { left: a, right: b, axisDir } : { left: b, right: a, axisDir };
}

/** Across the axis toward +x, from the axis direction read off the throat walls (pointing down them). */
const normalOf = (d: Point): Point => [-d[1], d[0]];

function measure(valve: ValvePart, seat: SeatPart, anchorY = 8) {
  const parts: Parts = { valve, seat, bore: BORE_80 };
  const outline = applyParts(handDrawnPort({ anchorY }), parts).outline;
  const { left, right, axisDir } = rings(outline);
  const across = normalOf(axisDir);
  const acrossOf = (p: Point): number => p[0] * across[0] + p[1] * across[1];
  return {
    axisDir,
    throat: distanceToLine(left[0].a, right[0]),
    throatMiddle: (acrossOf(left[0].a) + acrossOf(right[0].a)) / 2,
    gaugeMiddle: (acrossOf(left[2].b) + acrossOf(right[2].b)) / 2,
    gaugeLength: Math.hypot(left[2].b[0] - right[2].b[0], left[2].b[1] - right[2].b[1]),
    rings: [left, right].map((ring) => ({
      seatWidth: length(ring[2]),
      seatAngle: angleTo(ring[2], across),
      bottomCut: angleTo(ring[1], across),
      topCut: angleTo(ring[3], across),
    })),
  };
}

type RingMeasures = ReturnType<typeof measure>['rings'][number];

/** Both rings have these seat width (document units) and seat, bottom-cut and top-cut angles (deg). */
function expectRings(m: ReturnType<typeof measure>, want: RingMeasures): void {
  for (const ring of m.rings) {
    assertInDelta(ring.seatWidth, want.seatWidth);
    assertInDelta(ring.seatAngle, want.seatAngle);
    assertInDelta(ring.bottomCut, want.bottomCut);
    assertInDelta(ring.topCut, want.topCut);
  }
}

describe('seat rings', () => {
  it('have the throat, seat width and angles they were given, on both sides', () => {
    const m = measure(VALVE_40, SEAT_91);
    assertInDelta(m.throat, 36.4, 1e-9);
    expectRings(m, { seatWidth: 1.5, seatAngle: 45, bottomCut: 60, topCut: 30 });
    // The seat face's outer edges lie on the gauge line, a valve diameter apart, centred on the throat.
    assertInDelta(m.gaugeLength, 40);
    assertInDelta(m.throatMiddle, m.gaugeMiddle);
  });

  it('puts a 91 % throat on a 40 mm valve at 36.4 mm (common practice)', () => {
    // Seat throat 88-93 % of the valve, 90-91 % the usual safe choice [practice, REFERENCES.md 3a]; 0.91 x 40 = 36.4.
    assertInDelta(measure(VALVE_40, { ...SEAT_91, throatPct: 91 }).throat, 36.4, 1e-9);
    assertInDelta(measure(VALVE_40, { ...SEAT_91, throatPct: 88 }).throat, 35.2, 1e-9);
  });

  it('keeps its measures on a leaning valve: the throat walls lean with the axis', () => {
    // Leaning, the left end of the gauge line drops 20 sin 12 = 4.2 mm: a 5 mm recess keeps it above the deck.
    const leaning = { ...VALVE_40, axis: { x: 0, y: 2, inclinationDeg: 12 } };
    const seat = { ...SEAT_91, seatWidth: 1.2, topCutAngleDeg: 35, bottomCutAngleDeg: 65, recess: 5 };
    // Anchors 12 up, so both stay above the bottom cuts when the axis leans and there is a throat wall to read.
    const m = measure(leaning, seat, 12);
    // Opening down and toward +x at 12 deg: the axis read from the throat walls leans 12 deg from the vertical.
    assertInDelta(angleTo({ a: [0, 0], b: m.axisDir }, [0, 1]), 12, 1e-9);
    assertInDelta(m.throat, 36.4, 1e-9);
    expectRings(m, { seatWidth: 1.2, seatAngle: 45, bottomCut: 65, topCut: 35 });
  });

  it('moves the throat toward the side the offset names, by its share of the throat radius', () => {
    const centred = measure(VALVE_40, SEAT_91);
    const offset = measure(VALVE_40, { ...SEAT_91, throatOffsetPct: 3 });
    assertInDelta(offset.throat, 36.4, 1e-9);
    // 3 % of the 18.2 throat radius toward +x: 0.546; the seat (gauge line) stays on the valve.
    assertInDelta(offset.throatMiddle - centred.throatMiddle, 0.546, 1e-9);
    assertInDelta(offset.gaugeMiddle, centred.gaugeMiddle, 1e-12);
    // the bottom cut is shorter on the side the throat moved toward
    const cutLength = (p: Parts) => {
      const r = rings(applyParts(handDrawnPort(), p).outline);
      return [length(r.left[1]), length(r.right[1])];
    };
    const [left, right] = cutLength({ valve: VALVE_40, seat: { ...SEAT_91, throatOffsetPct: 3 }, bore: BORE_80 });
    expect(right).toBeLessThan(left);
  });

  it('refuses a throat that reaches past the seat, naming the side', () => {
    // The seat's inner edge is 20 - 1.5 cos 45 = 18.94 from the axis; 5 % of 18.2 puts the throat wall at 19.11.
    const build = () => applyParts(handDrawnPort(), { valve: VALVE_40, seat: { ...SEAT_91, throatOffsetPct: 5 }, bore: BORE_80 });
    expect(build).toThrow(PartsError);
    expect(build).toThrow(/On the right the throat reaches past the seat's inner edge/);
  });

  it('refuses a top cut that cannot reach the deck on a valve leaning more than the cut', () => {
    const leaning = { ...VALVE_40, axis: { x: 0, y: 2, inclinationDeg: 40 } };
    const deep = { ...SEAT_91, recess: 15 };
    expect(() => applyParts(handDrawnPort(), { valve: leaning, seat: deep, bore: BORE_80 })).toThrow(/On the right the top cut at 30 degrees never reaches the deck/);
    // with too little recess the low end of the gauge line is below the deck
    expect(() => applyParts(handDrawnPort(), { valve: leaning, seat: SEAT_91, bore: BORE_80 })).toThrow(/On the left the seat's outer edge lies below the deck/);
  });
});
