/**
 * Random edits for the edit-registry fuzz: an intent (which edit, and free numbers) is generated without the
 * document, then resolved against the document of the moment into a registry edit with mostly plausible arguments.
 */

import fc from 'fast-check';
import type { Outline, Point, PortDocument, Section, Variant } from '../../src/document/types.ts';
import { WALL_NAMES } from '../../src/document/types.ts';
import { activeVariant, isEditName } from '../../src/editor/index.ts';

/**
 * The registry edits the fuzz draws, each listed as often as it should be drawn; an edit the registry does not have
 * yet (setBench comes with format version 4) is left out until it does.
 */
export const DRAWN: readonly string[] = [
  'movePoint', 'movePoint', 'movePoint', 'insertVertex', 'insertVertex', 'deleteVertex', 'setFilletRadius', 'setFilletRadius',
  'setEdgeRole', 'setWallName', 'makeArc', 'makeCurve', 'makeLine', 'addVariant', 'renameVariant', 'setActiveVariant',
  'deleteVariant', 'setUnits', 'setPart', 'setPart', 'setLift', 'setLift', 'setParts', 'removeParts', 'setBench',
  'setWidthProfile', 'setAxisymmetric',
].filter(isEditName);

/** The edits a pointer drags: their steps go through the store with cause 'drag'. */
export const DRAGGED = ['movePoint', 'setFilletRadius', 'setLift'] as const;

/** What to do, before the document is known: numbers the resolver reads as it likes. */
export interface Intent {
  readonly edit: string;
  /** Picks a target (a point, an edge, a variant, a part, a name). */
  readonly n: number;
  /** Picks the island (outline mostly) or a second choice. */
  readonly m: number;
  /** Offsets in -1..1 and a size in 0..1, scaled to the section by the resolver. */
  readonly u: number;
  readonly v: number;
  readonly w: number;
  /** 0 for an argument out of all reason (an EditError is then the only right answer). */
  readonly wild: number;
}

/** Uniform numbers: fast-check's usual bias to 0 and the bounds would mostly move a point nowhere or pick corner 0. */
const uniform = (max: number): fc.Arbitrary<number> => fc.noBias(fc.integer({ min: 0, max }));
const unitDouble = uniform(2000).map((k) => k / 1000 - 1);

export const intentArb = (edits: readonly string[] = DRAWN): fc.Arbitrary<Intent> => fc.record({
  edit: fc.constantFrom(...edits), n: uniform(10_000), m: uniform(10_000),
  u: unitDouble, v: unitDouble, w: uniform(1000).map((k) => k / 1000), wild: uniform(24),
});

/** A registry edit ready for DocumentStore.edit. */
export interface EditCall {
  readonly name: string;
  readonly args: unknown;
}

const NAMES = [...WALL_NAMES, 'stock', 'ported', 'tight short side', ' padded ', '', 'x'.repeat(81), 'ünïcødé 🚀', 'two\nlines', '<b>bold</b>'];
const WILD: unknown[] = [{}, { vertex: 99_999 }, { edge: -1 }, { radius: -3 }, { lift: Number.NaN }, { name: 7 }, null, 'text', { to: [1e9, 0] }];

const pick = <T>(options: readonly T[], n: number): T => options[n % options.length];

/** Size of the section: the diagonal of its outline's corners, document units. */
function size(outline: Outline): number {
  const xs = outline.vertices.map((p) => p.at[0]), ys = outline.vertices.map((p) => p.at[1]);
  return Math.hypot(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) || 1;
}

/** The island to act on (absent: the outline), with its outline: the outline seven times in ten. */
function where(section: Section, m: number): { island?: number; outline: Outline } {
  if (m % 10 < 7 || section.islands.length === 0) return { outline: section.outline };
  const island = m % section.islands.length;
  return { island, outline: section.islands[island].outline };
}

function chord(outline: Outline, edge: number): [Point, Point] {
  const n = outline.vertices.length;
  return [outline.vertices[edge].at, outline.vertices[(edge + 1) % n].at];
}

/** A point along edge `edge`'s chord at fraction f, pushed off it by `off` chord lengths. */
function offChord(outline: Outline, edge: number, f: number, off: number): Point {
  const [a, b] = chord(outline, edge);
  const dx = b[0] - a[0], dy = b[1] - a[1];
  return [a[0] + f * dx - off * dy, a[1] + f * dy + off * dx];
}

/** Every draggable point of an outline with where it is. */
function pointsOf(outline: Outline, island: number | undefined): { ref: object; at: Point }[] {
  const own = island === undefined ? {} : { island };
  const out: { ref: object; at: Point }[] = outline.vertices.map((v, vertex) => ({ ref: { kind: 'vertex', vertex, ...own }, at: v.at }));
  outline.edges.forEach((e, edge) => {
    if (e.kind === 'arc') out.push({ ref: { kind: 'through', edge, ...own }, at: e.through });
    if (e.kind === 'curve') e.via.forEach((at, via) => out.push({ ref: { kind: 'via', edge, via, ...own }, at }));
  });
  return out;
}

/** The edit `intent` stands for on `doc`; `step` of `steps` walks a drag along its path (1 of 1 for a plain edit). */
export function resolve(doc: PortDocument, intent: Intent, step = 1, steps = 1): EditCall {
  const { edit, n, m, u, v, w } = intent;
  if (intent.wild === 0) return { name: edit, args: pick(WILD, n) };
  const variant = activeVariant(doc);
  const { island, outline } = where(variant.section, m);
  const own = island === undefined ? {} : { island };
  const scale = size(variant.section.outline) * (w < 0.5 ? 0.01 : 0.1) * (step / steps);
  const edge = n % outline.edges.length, vertex = n % outline.vertices.length;
  switch (edit) {
    case 'movePoint': {
      const { ref, at } = pick(pointsOf(outline, island), n);
      return { name: edit, args: { point: ref, to: [at[0] + u * scale, at[1] + v * scale] } };
    }
    case 'insertVertex': return { name: edit, args: { edge, ...own, at: offChord(outline, edge, w, 0.05 * u) } };
    case 'deleteVertex': return { name: edit, args: { vertex, ...own } };
    case 'setFilletRadius': {
      const radius = m % 10 === 0 ? 0 : w * w * size(outline) * 0.3 * (step / steps);
      return { name: edit, args: { vertex, ...own, radius } };
    }
    case 'setEdgeRole': return { name: edit, args: { edge, ...own, role: pick(['wall', 'inlet', 'outlet'], m) } };
    case 'setWallName': return { name: edit, args: { edge, ...own, name: pick(NAMES, m) } };
    case 'makeArc': return { name: edit, args: { edge, ...own, ...(w < 0.3 ? {} : { through: offChord(outline, edge, 0.5, 0.4 * u) }) } };
    case 'makeCurve': {
      const via = [offChord(outline, edge, 0.3, 0.2 * u), offChord(outline, edge, 0.7, 0.2 * v)].slice(0, 1 + (m % 2));
      return { name: edit, args: { edge, ...own, ...(w < 0.3 ? {} : { via }) } };
    }
    case 'makeLine': return { name: edit, args: { edge, ...own } };
    default: return resolveDocumentEdit(doc, intent, step, steps);
  }
}

/** Edits of variants, units and parts. */
function resolveDocumentEdit(doc: PortDocument, intent: Intent, step: number, steps: number): EditCall {
  const { edit, n, m, u, w } = intent;
  const names = doc.variants.map((x) => x.name);
  const parts = activeVariant(doc).parts;
  switch (edit) {
    case 'addVariant': return { name: edit, args: w < 0.5 ? {} : { name: pick(NAMES, m) } };
    case 'renameVariant': return { name: edit, args: { from: pick(names, n), to: pick([...NAMES, ...names], m) } };
    case 'setActiveVariant': return { name: edit, args: { name: pick([...names, 'no such variant'], n) } };
    case 'deleteVariant': return { name: edit, args: { name: pick(names, n) } };
    case 'setUnits': return { name: edit, args: { units: m % 5 === 0 ? doc.units : doc.units === 'mm' ? 'inch' : 'mm' } };
    case 'setLift': {
      const valve = parts?.valve;
      const lift = valve === undefined ? w * 10 : Math.max(0, valve.lift * (1 + 0.6 * u * (step / steps)));
      return { name: edit, args: { lift } };
    }
    case 'setPart': return { name: edit, args: partChange(parts as Record<string, unknown> | undefined, n, m, u) };
    case 'setParts': return { name: edit, args: { parts: pick(doc.variants, n).parts ?? (m % 2 === 0 ? {} : undefined) } };
    case 'removeParts': return { name: edit, args: {} };
    case 'setBench': return { name: edit, args: benchChange(doc, n, m, u) };
    case 'setWidthProfile': return { name: edit, args: widthChange(doc, n, m, u) };
    case 'setAxisymmetric': return { name: edit, args: roundChange(doc, n, m, u) };
    default: throw new Error(`no resolver for the edit "${edit}"`);
  }
}

/** The active variant's bench inputs with one number scaled by up to 20%, another variant's, or none. */
function benchChange(doc: PortDocument, n: number, m: number, u: number): unknown {
  const benchOf = (v: unknown): Record<string, unknown> | undefined => (v as { bench?: Record<string, unknown> }).bench;
  const own = benchOf(activeVariant(doc));
  if (own === undefined || m % 4 === 0) return { bench: benchOf(pick(doc.variants, n)) };
  const numeric = Object.keys(own).filter((k) => typeof own[k] === 'number');
  if (numeric.length === 0) return { bench: undefined };
  const key = pick(numeric, n);
  return { bench: { ...own, [key]: (own[key] as number) * (1 + 0.2 * u) } };
}

/** The active variant's width profile with one station's width scaled by up to 20%, another variant's, a fresh one or none. */
function widthChange(doc: PortDocument, n: number, m: number, u: number): unknown {
  const own = activeVariant(doc).width;
  if (m % 5 === 0) return { width: null };
  if (own === undefined || m % 4 === 0) {
    const other = pick(doc.variants, n).width;
    return { width: other ?? { stations: [{ along: 0, width: 30 * (1 + 0.2 * u) }, { along: 50, width: 34 }] } };
  }
  const k = n % own.stations.length;
  const stations = own.stations.map((s, i) => (i === k ? { ...s, width: s.width * (1 + 0.2 * u) } : s));
  return { width: { ...own, stations } };
}

/** None, either side of the valve's axis, or of an axis of its own near the valve's (it may leave the inlet on the far side). */
function roundChange(doc: PortDocument, n: number, m: number, u: number): unknown {
  if (m % 3 === 0) return { axisymmetric: null };
  const keep = n % 2 === 0 ? 'left' : 'right';
  const valve = activeVariant(doc).parts?.valve;
  if (valve === undefined || m % 3 === 1) return { axisymmetric: { keep } };
  return { axisymmetric: { axis: { ...valve.axis, x: valve.axis.x + 5 * u, inclinationDeg: 10 * u }, keep } };
}

/** One number of one existing part scaled by up to 20% (the valve's axis moved instead, now and then). */
function partChange(parts: Record<string, unknown> | undefined, n: number, m: number, u: number): unknown {
  const names = Object.keys(parts ?? {});
  if (names.length === 0) return { part: 'port', values: { tightestArea: 1000 * (1.5 + u) } };
  const part = pick(names, n);
  const values = (parts as Record<string, Record<string, unknown>>)[part];
  const numeric = Object.keys(values).filter((k) => typeof values[k] === 'number');
  if (part === 'valve' && m % 4 === 0) {
    const axis = values.axis as { x: number };
    return { part, values: { axis: { x: axis.x + 2 * u } } };
  }
  const key = pick(numeric, m);
  return { part, values: { [key]: (values[key] as number) * (1 + 0.2 * u) } };
}

