/** The test bore and the joining rule: what the anchors replace, on which side the bore sits, and what is refused. */

import { describe, expect, it } from 'vitest';
import type { Outline, Parts, Section } from '../../src/document/types.ts';
import { applyParts, sectionForSolver } from '../../src/parts/apply.ts';
import { anchorIndices } from '../../src/parts/anchors.ts';
import { PartsError } from '../../src/parts/errors.ts';
import { defaultTolerance, sectionToDomain } from '../../src/geometry/index.ts';
import { BORE_80, PARTS_40, SEAT_91, VALVE_40, assertInDelta, deepFreeze, handDrawnPort, runFromAnchor } from './helpers.ts';

/** The bore read from the outline: the two bore walls and the outlet between them. */
function bore(outline: Outline) {
  const run = runFromAnchor(outline, anchorIndices(outline)[0]);
  const walls = run.filter((r) => r.name?.startsWith('bore wall'));
  const outlets = run.filter((r) => r.role === 'outlet');
  expect(walls).toHaveLength(2);
  expect(outlets).toHaveLength(1);
  const xs = walls.map((w) => w.a[0]);
  const lowest = Math.min(...outline.vertices.map((v) => v.at[1]));
  return { walls, outlet: outlets[0], xs, lowest, order: run.map((r) => r.name ?? r.role) };
}

describe('test bore', () => {
  const outline = applyParts(handDrawnPort(), PARTS_40).outline;

  it('has the given diameter and depth, walls along the cylinder axis, the outlet across its far end', () => {
    const b = bore(outline);
    assertInDelta(Math.abs(b.xs[1] - b.xs[0]), 80);
    for (const w of b.walls) {
      assertInDelta(w.a[0], w.b[0], 0); // straight down the cylinder axis (y)
      assertInDelta(Math.abs(w.a[1] - w.b[1]), 50);
      assertInDelta(Math.max(w.a[1], w.b[1]), 0); // its top is the deck, 2 below the gauge line at y = 2
    }
    // the outlet joins the bottoms of the two walls and is the lowest thing in the section
    assertInDelta(b.outlet.a[1], -50);
    assertInDelta(b.outlet.b[1], -50);
    assertInDelta(b.lowest, -50);
    // each side named for the porter: the manifold side's port walls are the short side's
    const short = ['throat (short side)', 'seat (short side)', 'seat (short side)', 'seat (short side)'];
    const long = ['seat (long side)', 'seat (long side)', 'seat (long side)', 'throat (long side)'];
    expect(b.order).toEqual([
      ...short, 'deck (manifold side)', 'bore wall (manifold side)', 'outlet', 'bore wall (far side)', 'deck (far side)', ...long,
    ]);
  });

  it('puts the nearer wall on the manifold side, the given distance from the valve edge', () => {
    // valve edge at x = -20 (axis 0, 40 mm valve), manifold on the left: nearer wall at -26, far wall 80 beyond
    expect(bore(outline).xs.sort((a, b) => a - b)).toEqual([-26, 54]);
    // mirrored port, manifold on the right: the nearer wall moves to the right
    const mirrored = applyParts(handDrawnPort({ mirror: true }), PARTS_40).outline;
    expect(bore(mirrored).xs.sort((a, b) => a - b)).toEqual([-54, 26]);
  });

  it('names each side for the porter, whichever side the manifold is on', () => {
    // anchors 20 from the axis, off the 18.2 throat line: a generated bowl step joins each anchor to its throat wall
    for (const mirror of [false, true]) {
      const out = applyParts(handDrawnPort({ mirror, anchorX: 20 }), PARTS_40).outline;
      const manifoldX = mirror ? 1 : -1;
      const generated = runFromAnchor(out, anchorIndices(out)[0]).filter((r) => r.role === 'wall');
      // bowl, throat, three seat cuts and deck on each side, and the two bore walls
      expect(generated).toHaveLength(14);
      for (const r of generated) {
        const onManifoldSide = Math.sign(r.a[0] + r.b[0]) === manifoldX;
        const past = /^(deck|bore wall) /.test(r.name!);
        const side = past ? (onManifoldSide ? '(manifold side)' : '(far side)') : onManifoldSide ? '(short side)' : '(long side)';
        const base = r.name!.slice(0, r.name!.lastIndexOf(' ('));
        expect(['bowl', 'throat', 'seat', 'deck', 'bore wall']).toContain(base);
        expect(r.name, JSON.stringify(r)).toBe(`${base} ${side}`);
      }
      expect(generated.filter((r) => r.name!.startsWith('bowl')).map((r) => r.name).sort()).toEqual(['bowl (long side)', 'bowl (short side)']);
    }
  });

  it('refuses a bore whose wall cuts into the seat', () => {
    const tight = { ...PARTS_40, bore: { ...BORE_80, valveEdgeToWall: 1 } };
    // the top cut reaches the deck 20 + 2 / tan 30 = 23.46 from the axis: a wall at 21 cuts it
    expect(() => applyParts(handDrawnPort(), tight)).toThrow(/On the left the test bore wall cuts into the seat's top cut: move the nearer wall out/);
    const narrow = { ...PARTS_40, bore: { ...BORE_80, diameter: 45 } };
    expect(() => applyParts(handDrawnPort(), narrow)).toThrow(/On the right .* make the bore wider/);
  });
});

describe('joining the hand-drawn outline', () => {
  const drawn = deepFreeze(handDrawnPort());

  it('replaces only the stretch between the anchors, keeps the anchors, and leaves its input alone', () => {
    const out = applyParts(drawn, PARTS_40);
    const [a, b] = anchorIndices(out.outline);
    expect(out.outline.vertices.slice(0, a + 1)).toEqual(drawn.outline.vertices.slice(0, 5));
    expect(out.outline.vertices.slice(b)).toEqual(drawn.outline.vertices.slice(5));
    expect(out.outline.edges.slice(0, a)).toEqual(drawn.outline.edges.slice(0, 4));
    expect(out.outline.edges.slice(b)).toEqual(drawn.outline.edges.slice(5));
    expect(() => sectionToDomain(out, defaultTolerance(out))).not.toThrow();
  });

  it('gives the same section when applied again (generated geometry is regenerated, not stacked)', () => {
    const once = applyParts(drawn, PARTS_40);
    expect(applyParts(once, PARTS_40)).toEqual(once);
    expect(sectionForSolver({ name: 'v', parts: PARTS_40, section: once })).toEqual(once);
  });

  it('follows a changed number: a smaller throat moves the throat walls in', () => {
    const at91 = applyParts(drawn, PARTS_40);
    const at88 = applyParts(at91, { ...PARTS_40, seat: { ...SEAT_91, throatPct: 88 } });
    const throatX = (s: Section) => s.outline.edges.flatMap((e, i) => (e.wallName?.startsWith('throat') ? [s.outline.vertices[i + 1].at[0]] : []));
    expect(throatX(at91)).toEqual([-18.2, 18.2]);
    expect(throatX(at88).map((x) => Math.round(x * 1e9) / 1e9)).toEqual([-17.6, 17.6]);
  });

  it('finds the pocket when it runs past corner 0, starting the result at the second anchor', () => {
    // the same port, listed from the right anchor: the pocket (right anchor ... left anchor) wraps past corner 0
    const n = drawn.outline.vertices.length;
    const turn = <T>(items: readonly T[]) => items.map((_, i) => items[(i + 5) % n]);
    const turned = { outline: { vertices: turn(drawn.outline.vertices), edges: turn(drawn.outline.edges) }, islands: [] };
    const plain = applyParts(drawn, PARTS_40).outline, wrapped = applyParts(turned, PARTS_40).outline;
    expect(wrapped.vertices[0]).toEqual(drawn.outline.vertices[5]);
    const fromRight = (o: Outline) => runFromAnchor(o, anchorIndices(o).find((i) => o.vertices[i].at[0] > 0)!);
    expect(fromRight(wrapped)).toEqual(fromRight(plain));
    expect(applyParts({ outline: wrapped, islands: [] }, PARTS_40).outline).toEqual(wrapped);
  });

  it('refuses anchors that do not split off the valve pocket', () => {
    const withAnchors = (flags: boolean[]): Section => ({
      ...drawn,
      outline: { ...drawn.outline, vertices: drawn.outline.vertices.map((v, i) => ({ at: v.at, ...(flags[i] ? { anchor: true as const } : {}) })) },
    });
    const refused = (s: Section, message: RegExp) => {
      expect(() => applyParts(s, PARTS_40)).toThrow(PartsError);
      expect(() => applyParts(s, PARTS_40)).toThrow(message);
    };
    refused(withAnchors([false, false, false, false, true]), /the outline has 1/);
    // both on the left of the axis
    refused(withAnchors([false, false, false, true, true]), /Both anchor corners are on the left of the valve axis/);
    // a second inlet edge between the anchors: both stretches hold an inlet, so neither is the pocket
    refused(withInletSplit(), /inlet edges on both sides/);
    const noInlet = { ...drawn, outline: { ...drawn.outline, edges: drawn.outline.edges.map((e) => ({ ...e, role: 'wall' as const })) } };
    refused(noInlet, /no inlet/);
  });

  it('needs the valve, and the seat and bore together', () => {
    expect(() => applyParts(drawn, { seat: SEAT_91, bore: BORE_80 })).toThrow(/needs a valve/);
    expect(() => applyParts(drawn, { valve: VALVE_40, seat: SEAT_91 })).toThrow(/generated together; give both/);
    const valveOnly = applyParts(drawn, { valve: VALVE_40 });
    expect(valveOnly.outline).toBe(drawn.outline);
    const none: Parts = {};
    expect(applyParts(drawn, none)).toBe(drawn);
    expect(applyParts(drawn, { port: { tightestArea: 900 } })).toBe(drawn);
  });
});

/** The test port with a second inlet edge (the roof) so both stretches between the anchors hold an inlet. */
function withInletSplit(): Section {
  const s = handDrawnPort();
  const edges = s.outline.edges.map((e, i) => (i === 4 ? { kind: 'line' as const, role: 'inlet' as const } : e));
  return { ...s, outline: { ...s.outline, edges } };
}
