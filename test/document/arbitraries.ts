/** fast-check generators of valid section documents (valid by the schema; the geometry need not make sense). */

import fc from 'fast-check';
import type { BenchInputs, Edge, Island, Outline, Parts, PortDocument, Section, Variant, Vertex, WidthProfile } from '../../src/document/types.ts';
import { FORMAT_VERSION } from '../../src/document/types.ts';
import {
  BENCH_BOUNDS, type BenchBound, MAX_COORDINATE, MAX_FILLET_RADIUS, MAX_NAME_LENGTH, MAX_PART_LENGTH, MAX_PORT_AREA, MAX_VALVE_INCLINATION_DEG,
} from '../../src/document/limits.ts';

/** Plain objects, as a loaded file gives (fc.record may otherwise build null-prototype ones). */
const PLAIN = { noNullPrototype: true } as const;

const coordinate = fc.double({ min: -MAX_COORDINATE, max: MAX_COORDINATE, noNaN: true });
export const pointArb = fc.tuple(coordinate, coordinate);

/** A one-line, non-blank label of 1..max UTF-16 units, from any Unicode text. */
export function labelArb(max = MAX_NAME_LENGTH): fc.Arbitrary<string> {
  const units = ['grapheme', 'grapheme-ascii', 'binary'] as const;
  return fc
    .oneof(...units.map((unit) => fc.string({ unit, minLength: 1, maxLength: max })))
    .filter((s) => s.length <= max && s.trim().length > 0 && !/[\u0000-\u001f\u007f]/.test(s));
}

const vertexArb: fc.Arbitrary<Vertex> = fc.record(
  { at: pointArb, filletRadius: fc.double({ min: 0, max: MAX_FILLET_RADIUS, noNaN: true }) },
  { requiredKeys: ['at'], noNullPrototype: true },
);

const roleArb = fc.constantFrom('wall', 'inlet', 'outlet') as fc.Arbitrary<Edge['role']>;

function edgeArb(role: fc.Arbitrary<Edge['role']>): fc.Arbitrary<Edge> {
  const base = { role, wallName: labelArb() };
  return fc.oneof(
    fc.record({ kind: fc.constant('line' as const), ...base }, { requiredKeys: ['kind', 'role'], noNullPrototype: true }),
    fc.record({ kind: fc.constant('arc' as const), ...base, through: pointArb }, { requiredKeys: ['kind', 'role', 'through'], noNullPrototype: true }),
    fc.record(
      { kind: fc.constant('curve' as const), ...base, via: fc.array(pointArb, { maxLength: 4 }) },
      { requiredKeys: ['kind', 'role', 'via'], noNullPrototype: true },
    ),
  );
}

function outlineArb(role: fc.Arbitrary<Edge['role']>): fc.Arbitrary<Outline> {
  return fc.integer({ min: 3, max: 7 }).chain((n) =>
    fc.record({
      vertices: fc.array(vertexArb, { minLength: n, maxLength: n }),
      edges: fc.array(edgeArb(role), { minLength: n, maxLength: n }),
    }, PLAIN),
  );
}

const islandArb: fc.Arbitrary<Island> = fc.record({ name: labelArb(), outline: outlineArb(fc.constant('wall')) }, PLAIN);
const sectionArb: fc.Arbitrary<Section> = fc.record({ outline: outlineArb(roleArb), islands: fc.array(islandArb, { maxLength: 2 }) }, PLAIN);
const positive = fc.double({ min: 0, max: MAX_PART_LENGTH, minExcluded: true, noNaN: true });
const fromZero = fc.double({ min: 0, max: MAX_PART_LENGTH, noNaN: true });
const cutAngle = fc.double({ min: 0, max: 90, minExcluded: true, maxExcluded: true, noNaN: true });
const lean = fc.double({ min: -MAX_VALVE_INCLINATION_DEG, max: MAX_VALVE_INCLINATION_DEG, noNaN: true });

/** A valve and a measured port area: parts that need no anchor corners (the numbers need not make a valve). */
const partsArb: fc.Arbitrary<Parts> = fc.record(
  {
    valve: fc.record({
      diameter: positive, seatAngleDeg: cutAngle, seatFaceWidth: positive, margin: fromZero, backCutAngleDeg: cutAngle,
      headThickness: positive, stemDiameter: positive, stemLength: positive,
      axis: fc.record({ x: coordinate, y: coordinate, inclinationDeg: lean }, PLAIN), lift: fromZero,
    }, PLAIN),
    port: fc.record({ tightestArea: fc.double({ min: 0, max: MAX_PORT_AREA, minExcluded: true, noNaN: true }) }, PLAIN),
  },
  { requiredKeys: [], noNullPrototype: true },
);

/** Any number a bench input may hold, bounds included (a whole number where the bound says so). */
function benchNumberArb(bound: BenchBound): fc.Arbitrary<number> {
  if (bound.integer) return fc.integer({ min: bound.min, max: bound.max });
  return fc.double({ min: bound.min, max: bound.max, minExcluded: bound.aboveMin === true, noNaN: true, noDefaultInfinity: true });
}

/** Bench inputs with any subset of the numbers and choices. */
const benchArb: fc.Arbitrary<BenchInputs> = fc.record(
  {
    ...(Object.fromEntries(Object.entries(BENCH_BOUNDS).map(([key, bound]) => [key, benchNumberArb(bound)])) as Record<keyof typeof BENCH_BOUNDS, fc.Arbitrary<number>>),
    humidityModel: fc.constantFrom('cipm-2007', 'ideal-mixture') as fc.Arbitrary<BenchInputs['humidityModel']>,
    referenceArea: fc.constantFrom('curtain', 'throat', 'valve head') as fc.Arbitrary<BenchInputs['referenceArea']>,
    flowScale: fc.constantFrom('ideal speed', 'bench flow / port area', 'mean port speed') as fc.Arbitrary<BenchInputs['flowScale']>,
  },
  { requiredKeys: [], noNullPrototype: true },
);

/** A width profile of 2 to 6 stations at distinct distances along the port, in order (no obstructions: they need a valve). */
const widthArb: fc.Arbitrary<WidthProfile> = fc
  .uniqueArray(fc.double({ min: 0, max: 1e6, noNaN: true }), { minLength: 2, maxLength: 6 })
  .chain((alongs) => fc.array(positive, { minLength: alongs.length, maxLength: alongs.length }).map((widths) => ({
    stations: [...alongs].sort((a, b) => a - b).map((along, k) => ({ along: along + 0, width: widths[k] })),
  })));

const variantArb: fc.Arbitrary<Variant> = fc.record(
  { name: labelArb(), note: fc.string({ maxLength: 200 }), parts: partsArb, bench: benchArb, width: widthArb, section: sectionArb },
  { requiredKeys: ['name', 'section'], noNullPrototype: true },
);

/** A valid current-version document with 1..3 variants. */
export const documentArb: fc.Arbitrary<PortDocument> = fc
  .uniqueArray(variantArb, { minLength: 1, maxLength: 3, selector: (v) => v.name })
  .chain((variants) =>
    fc.record({
      format: fc.constant('portwright-section' as const),
      version: fc.constant(FORMAT_VERSION),
      title: labelArb(120),
      units: fc.constantFrom('mm', 'inch') as fc.Arbitrary<PortDocument['units']>,
      variants: fc.constant(variants),
      activeVariant: fc.constantFrom(...variants.map((v) => v.name)),
      settings: fc.record({ gridDetail: fc.constantFrom('preview', 'standard', 'fine') as fc.Arbitrary<'preview'> }, PLAIN),
    }, PLAIN),
  );
