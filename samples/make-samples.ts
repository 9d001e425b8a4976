/**
 * Builds the sample sections: an invented street intake port for a 46 mm valve at 10 mm lift over a test bore,
 * once with a tight and once with a generous short-side radius. Run `npx tsx samples/make-samples.ts` to rewrite
 * the JSON files next to this script; test/document checks that the files match what this script builds.
 *
 * Frame (mm): x to the right from the manifold face (x = 0), y up from the deck face of the head (y = 0).
 * The valve axis is vertical at x = VALVE_AXIS_X; the port runs right from the manifold face, then the floor turns
 * down 65 degrees over the short side into the bowl, throat and seat; the roof (long side) follows on the far side.
 */

import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import {
  FORMAT_VERSION, type BenchInputs, type Edge, type Parts, type PortDocument, type Section, type Variant, type Vertex, type WidthProfile,
} from '../src/document/types.ts';
import { saveDocument } from '../src/document/load.ts';
import { applyParts } from '../src/parts/apply.ts';
import { cfmToM3s, inH2OToPa } from '../src/breathing/units.ts';

const VALVE_DIAMETER = 46;
const VALVE_LIFT = 10;
/** Throat (the bore under the seat) as a share of the valve head: 91%, the usual safe choice [practice]. */
const THROAT_PCT = 91;
const VALVE_AXIS_X = 95;
/** The gauge line (outer edge of the seat face) sits 2.3 mm above the deck. */
const SEAT_RECESS = 2.3;
/** The bowl meets the throat 8 mm above the deck: the anchor corners where the generated seat joins the port. */
const ANCHOR_Y = 8;
/** Port: 42 mm tall at the manifold face, floor 30 mm above the deck, turning down 65 deg into the bowl. */
const FLOOR_Y = 30;
const ROOF_Y = 72;
const TURN_DEG = 65;
const BOWL_TOP_Y = 15;
/** The bowl is 45 mm across at its top, narrowing to the 41.9 mm throat. */
const BOWL_TOP_R = 22.5;
const LONG_SIDE_RADIUS = 30;
/** Test bore: 88 mm (about 1.9 x the valve), 60 mm deep, 8 mm from the valve edge to the wall on the manifold side. */
const BORE_DIAMETER = 88;
const BORE_DEPTH = 60;
const VALVE_TO_WALL = 8;

/**
 * The parts: a 46 mm valve with a 45 deg seat face 2.8 mm wide, a 1.2 mm margin, a 30 deg back cut to an 8 mm
 * thick head and an 8 mm stem drawn 21 mm up from the face; a three-angle seat (30 deg top cut, 45 deg seat 1.8 mm
 * wide, 60 deg bottom cut) with a 91% throat; the 88 x 60 mm test bore.
 */
const PARTS: Parts = {
  valve: {
    diameter: VALVE_DIAMETER, seatAngleDeg: 45, seatFaceWidth: 2.8, margin: 1.2, backCutAngleDeg: 30,
    headThickness: 8, stemDiameter: 8, stemLength: 21, axis: { x: VALVE_AXIS_X, y: SEAT_RECESS, inclinationDeg: 0 },
    lift: VALVE_LIFT,
  },
  seat: { throatPct: THROAT_PCT, seatWidth: 1.8, topCutAngleDeg: 30, bottomCutAngleDeg: 60, throatOffsetPct: 0, recess: SEAT_RECESS },
  bore: { diameter: BORE_DIAMETER, depth: BORE_DEPTH, valveEdgeToWall: VALVE_TO_WALL },
};

const round = (v: number): number => Math.round(v * 100) / 100 + 0; // + 0 turns -0 into 0
const at = (x: number, y: number, filletRadius?: number): Vertex =>
  filletRadius === undefined ? { at: [round(x), round(y)] } : { at: [round(x), round(y)], filletRadius };
const anchor = (x: number, y: number): Vertex => ({ at: [round(x), round(y)], anchor: true });
const wall = (wallName: string): Edge => ({ kind: 'line', role: 'wall', wallName });

/**
 * The hand-drawn outline, counter-clockwise from the top of the manifold face, down to the two anchor corners where
 * the bowl meets the throat; the valve pocket between them is one placeholder edge until the parts fill it.
 */
function portOutline(shortSideRadius: number): Section['outline'] {
  const run = 1 / Math.tan((TURN_DEG * Math.PI) / 180);
  const nearBowlX = VALVE_AXIS_X - BOWL_TOP_R;
  const farBowlX = VALVE_AXIS_X + BOWL_TOP_R;
  const throatR = (THROAT_PCT / 100) * (VALVE_DIAMETER / 2);
  const vertices: Vertex[] = [
    at(0, ROOF_Y), at(0, FLOOR_Y), at(45, FLOOR_Y),
    at(nearBowlX - (FLOOR_Y - BOWL_TOP_Y) * run, FLOOR_Y, shortSideRadius), at(nearBowlX, BOWL_TOP_Y),
    anchor(VALVE_AXIS_X - throatR, ANCHOR_Y), anchor(VALVE_AXIS_X + throatR, ANCHOR_Y), at(farBowlX, BOWL_TOP_Y),
    at(farBowlX - (ROOF_Y - BOWL_TOP_Y) * run, ROOF_Y, LONG_SIDE_RADIUS),
  ];
  // The manifold is on the left (-1), so the bowl there is the short side's and the one across the valve the long side's,
  // named as the parts name the seat and throat below them.
  const bowl = (from: Vertex, to: Vertex, side: -1 | 1): Edge => ({
    kind: 'curve', role: 'wall', wallName: side < 0 ? 'bowl (short side)' : 'bowl (long side)',
    // One point at mid-height, 0.4 mm outside the chord: the bowl is a shallow pocket above the throat.
    via: [[round((from.at[0] + to.at[0]) / 2 + side * 0.4), round((from.at[1] + to.at[1]) / 2)]],
  });
  const edges: Edge[] = [
    { kind: 'line', role: 'inlet' }, wall('floor'), wall('short side'), wall('short side'),
    bowl(vertices[4], vertices[5], -1), wall('seat'), bowl(vertices[6], vertices[7], 1),
    wall('long side'), wall('long side'),
  ];
  return { vertices, edges };
}

function variant(name: string, shortSideRadius: number): Variant {
  const throat = (THROAT_PCT / 100) * VALVE_DIAMETER;
  return {
    name,
    note:
      `${VALVE_DIAMETER} mm intake valve at ${VALVE_LIFT.toFixed(1)} mm lift (L/D ${(VALVE_LIFT / VALVE_DIAMETER).toFixed(2)}); ` +
      `throat ${throat.toFixed(1)} mm (${THROAT_PCT}% of the valve); short-side radius ${shortSideRadius} mm; ` +
      `test bore ${BORE_DIAMETER} mm x ${BORE_DEPTH} mm deep.`,
    parts: PARTS,
    section: applyParts({ outline: portOutline(shortSideRadius), islands: [] }, PARTS),
  };
}

function document(title: string, variants: Variant[]): PortDocument {
  return {
    format: 'portwright-section', version: FORMAT_VERSION, title, units: 'mm',
    activeVariant: variants[0].name, settings: { gridDetail: 'standard' }, variants,
  };
}

const TIGHT = variant('tight short side', 4);
const GENEROUS = variant('generous short side', 14);

/** SI to nine significant digits, so the file reads 0.112323481 rather than the float's last digits, and shows 238 CFM again. */
const nine = (v: number): number => Number(v.toPrecision(9));

/**
 * Invented bench inputs for the comparison file: a room at 20 °C, 100.8 kPa and 45% humidity, the bench at
 * 28 in H2O, an 86 x 86 mm four-cylinder at 6500 rpm; the tight short side flowed 238 CFM, the generous one 251.
 */
function benchInputs(cfm: number): BenchInputs {
  return {
    airTemperatureK: 293.15, barometricPressurePa: 100_800, relativeHumidityPct: 45, testPressurePa: nine(inH2OToPa(28)),
    measuredFlowM3PerS: nine(cfmToM3s(cfm)), boreM: 0.086, strokeM: 0.086, engineSpeedRpm: 6500, cylinderCount: 4,
    meanFlowCoefficient: 0.35, hpPerCfm: 0.26, humidityModel: 'cipm-2007', referenceArea: 'curtain', flowScale: 'ideal speed',
  };
}

/**
 * An invented width profile for the tight street port (distances along the port as its reading measures them, from
 * the manifold face): 34 mm at the gasket, 30.5 mm past a head-bolt boss before the turn, the bowl opening to 50 mm
 * round the valve guide, down to the 41.9 mm throat and out to the 46 mm valve, then the 88 mm test bore. The 8 mm
 * stem crosses the bowl from the top of its drawn stub into the roof; the 14 mm guide boss stands 13 mm proud of the
 * roof (about 61 mm up the axis from the gauge line there).
 */
const WIDTHS: WidthProfile = {
  stations: [
    { along: 0, width: 34 }, { along: 30, width: 32 }, { along: 58, width: 30.5 }, { along: 75, width: 36 },
    { along: 92, width: 50 }, { along: 108, width: 50 }, { along: 120, width: 42 }, { along: 132, width: 46 },
    { along: 150, width: 88 },
  ],
  obstructions: [
    { name: 'valve stem', diameter: 8, from: 9, to: 75 },
    { name: 'guide boss', diameter: 14, from: 48, to: 75 },
  ],
};

/** File name (in samples/) -> document. */
export function buildSamples(): Record<string, PortDocument> {
  return {
    'street-tight-short-side.json': document('Street intake, 46 mm valve: tight short side', [TIGHT]),
    'street-generous-short-side.json': document('Street intake, 46 mm valve: generous short side', [GENEROUS]),
    'short-side-compare.json': document('Street intake, 46 mm valve: short-side radius compared', [
      { ...TIGHT, bench: benchInputs(238) }, { ...GENEROUS, bench: benchInputs(251) },
    ]),
    'street-port-widths.json': document('Street intake, 46 mm valve: tight short side with the port widths', [
      { ...TIGHT, name: 'tight short side, widths', width: WIDTHS },
    ]),
    // The valve, seat and bore region solved round about the valve axis, on the manifold side of it (README, "Round").
    'street-valve-round.json': document('Street intake, 46 mm valve: tight short side, round about the valve axis', [
      { ...TIGHT, name: 'tight short side, round', axisymmetric: { keep: 'left' } },
    ]),
  };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  for (const [file, doc] of Object.entries(buildSamples())) {
    writeFileSync(new URL(file, import.meta.url), saveDocument(doc));
    console.log(`wrote samples/${file}`);
  }
}
