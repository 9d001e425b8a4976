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
import type { Edge, Island, PortDocument, Section, Variant, Vertex } from '../src/document/types.ts';
import { saveDocument } from '../src/document/load.ts';

const VALVE_DIAMETER = 46;
const VALVE_LIFT = 10;
/** Throat (the bore under the seat) as a share of the valve head: 91%, the usual safe choice [practice]. */
const THROAT_RATIO = 0.91;
const VALVE_AXIS_X = 95;
/** Seat: 45 deg face from diameter 43.0 to 45.6, a 60 deg cut up to the throat, a 30 deg cut down to the deck. */
const SEAT_INNER_R = 21.5;
const SEAT_OUTER_R = 22.8;
const SEAT_OUTER_Y = 2.5;
const THROAT_LENGTH = 3;
/** Port: 42 mm tall at the manifold face, floor 30 mm above the deck, turning down 65 deg into the bowl. */
const FLOOR_Y = 30;
const ROOF_Y = 72;
const TURN_DEG = 65;
const BOWL_TOP_Y = 15;
/** The bowl is 45 mm across at its top, flaring out from the 41.9 mm throat. */
const BOWL_TOP_R = 22.5;
const LONG_SIDE_RADIUS = 30;
/** Test bore: 88 mm (about 1.9 x the valve), 60 mm deep, 8 mm from the valve edge to the wall on the manifold side. */
const BORE_DIAMETER = 88;
const BORE_DEPTH = 60;
const VALVE_TO_WALL = 8;

const round = (v: number): number => Math.round(v * 100) / 100 + 0; // + 0 turns -0 into 0
const at = (x: number, y: number, filletRadius?: number): Vertex =>
  filletRadius === undefined ? { at: [round(x), round(y)] } : { at: [round(x), round(y)], filletRadius };
const wall = (wallName: string): Edge => ({ kind: 'line', role: 'wall', wallName });

/** The seat profile on one side of the valve axis, from the throat top down to the deck; side -1 near, +1 far. */
function seatProfile(side: -1 | 1): Vertex[] {
  const x = (r: number): number => VALVE_AXIS_X + side * r;
  const throatR = (THROAT_RATIO * VALVE_DIAMETER) / 2;
  const seatInnerY = SEAT_OUTER_Y + (SEAT_OUTER_R - SEAT_INNER_R); // 45 deg face
  const throatBottomY = seatInnerY + (SEAT_INNER_R - throatR) * Math.tan((60 * Math.PI) / 180);
  const deckR = SEAT_OUTER_R + SEAT_OUTER_Y / Math.tan((30 * Math.PI) / 180);
  return [
    at(x(throatR), throatBottomY + THROAT_LENGTH),
    at(x(throatR), throatBottomY),
    at(x(SEAT_INNER_R), seatInnerY),
    at(x(SEAT_OUTER_R), SEAT_OUTER_Y),
    at(x(deckR), 0),
  ];
}

/** The section outline, counter-clockwise from the top of the manifold face. */
function portOutline(shortSideRadius: number): Section['outline'] {
  const run = 1 / Math.tan((TURN_DEG * Math.PI) / 180);
  const nearBowlX = VALVE_AXIS_X - BOWL_TOP_R;
  const farBowlX = VALVE_AXIS_X + BOWL_TOP_R;
  const boreNearX = VALVE_AXIS_X - VALVE_DIAMETER / 2 - VALVE_TO_WALL;
  const near = seatProfile(-1);
  const far = seatProfile(1).reverse();
  const vertices: Vertex[] = [
    at(0, ROOF_Y), at(0, FLOOR_Y), at(45, FLOOR_Y),
    at(nearBowlX - (FLOOR_Y - BOWL_TOP_Y) * run, FLOOR_Y, shortSideRadius), at(nearBowlX, BOWL_TOP_Y),
    ...near, at(boreNearX, 0), at(boreNearX, -BORE_DEPTH), at(boreNearX + BORE_DIAMETER, -BORE_DEPTH),
    at(boreNearX + BORE_DIAMETER, 0), ...far, at(farBowlX, BOWL_TOP_Y),
    at(farBowlX - (ROOF_Y - BOWL_TOP_Y) * run, ROOF_Y, LONG_SIDE_RADIUS),
  ];
  const bowl = (from: Vertex, to: Vertex, side: -1 | 1): Edge => ({
    kind: 'curve', role: 'wall', wallName: 'bowl',
    // One point at mid-height, 0.4 mm outside the chord: the bowl is a shallow pocket above the throat.
    via: [[round((from.at[0] + to.at[0]) / 2 + side * 0.4), round((from.at[1] + to.at[1]) / 2)]],
  });
  const edges: Edge[] = [
    { kind: 'line', role: 'inlet' }, wall('floor'), wall('short side'), wall('short side'),
    bowl(vertices[4], vertices[5], -1), wall('seat'), wall('seat'), wall('seat'), wall('seat'), wall('deck'),
    wall('bore wall'), { kind: 'line', role: 'outlet' }, wall('bore wall'), wall('deck'),
    wall('seat'), wall('seat'), wall('seat'), wall('seat'), bowl(vertices[18], vertices[19], 1),
    wall('long side'), wall('long side'),
  ];
  return { vertices, edges };
}

/**
 * The valve head at lift, as an island: flat face, 1.2 mm margin, 45 deg seat face, a 30 deg back running into a
 * 6 mm neck radius, and an 8 mm stem cut off 21 mm above the face. Closed, its seat face lies on the seat's.
 */
function valveHead(liftMm: number): Island {
  const seatLine = SEAT_OUTER_R + SEAT_OUTER_Y; // r + y on the 45 deg seat face
  const margin = 1.2, faceTopR = 21, neckR = 4, neckY = 13, stemTopY = 21;
  const closedFaceY = seatLine - VALVE_DIAMETER / 2 - margin;
  const y0 = closedFaceY - liftMm;
  const p = (r: number, y: number, fillet?: number): Vertex => at(VALVE_AXIS_X + r, y0 + y, fillet);
  const faceTopY = margin + (VALVE_DIAMETER / 2 - faceTopR);
  const vertices = [
    p(-VALVE_DIAMETER / 2, 0), p(VALVE_DIAMETER / 2, 0), p(VALVE_DIAMETER / 2, margin), p(faceTopR, faceTopY),
    p(neckR, neckY, 6), p(neckR, stemTopY), p(-neckR, stemTopY), p(-neckR, neckY, 6), p(-faceTopR, faceTopY),
    p(-VALVE_DIAMETER / 2, margin),
  ];
  return { name: 'valve head', outline: { vertices, edges: vertices.map((): Edge => ({ kind: 'line', role: 'wall' })) } };
}

function variant(name: string, shortSideRadius: number): Variant {
  const throat = THROAT_RATIO * VALVE_DIAMETER;
  return {
    name,
    note:
      `${VALVE_DIAMETER} mm intake valve at ${VALVE_LIFT.toFixed(1)} mm lift (L/D ${(VALVE_LIFT / VALVE_DIAMETER).toFixed(2)}); ` +
      `throat ${throat.toFixed(1)} mm (${Math.round(THROAT_RATIO * 100)}% of the valve); short-side radius ${shortSideRadius} mm; ` +
      `test bore ${BORE_DIAMETER} mm x ${BORE_DEPTH} mm deep.`,
    section: { outline: portOutline(shortSideRadius), islands: [valveHead(VALVE_LIFT)] },
  };
}

function document(title: string, variants: Variant[]): PortDocument {
  return {
    format: 'portwright-section', version: 3, title, units: 'mm',
    activeVariant: variants[0].name, settings: { gridDetail: 'standard' }, variants,
  };
}

const TIGHT = variant('tight short side', 4);
const GENEROUS = variant('generous short side', 14);

/** File name (in samples/) -> document. */
export function buildSamples(): Record<string, PortDocument> {
  return {
    'street-tight-short-side.json': document('Street intake, 46 mm valve: tight short side', [TIGHT]),
    'street-generous-short-side.json': document('Street intake, 46 mm valve: generous short side', [GENEROUS]),
    'short-side-compare.json': document('Street intake, 46 mm valve: short-side radius compared', [TIGHT, GENEROUS]),
  };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  for (const [file, doc] of Object.entries(buildSamples())) {
    writeFileSync(new URL(file, import.meta.url), saveDocument(doc));
    console.log(`wrote samples/${file}`);
  }
}
