/**
 * The width table's changes as pure functions on a variant's width profile: each returns the new profile, or throws
 * WidthTableError with a whole-sentence message when the typed value cannot stand. Lengths in document units.
 */
import { lengthLabel } from '../../breathing/units.ts';
import { MAX_PART_LENGTH, MAX_WIDTH_ALONG, MAX_WIDTH_OBSTRUCTIONS, MAX_WIDTH_STATIONS } from '../../document/limits.ts';
import type { Units, WidthObstruction, WidthProfile, WidthStation } from '../../document/types.ts';
import { boxText } from '../box-precision.ts';

/** A typed or dragged value the table refuses; `message` is one or more whole sentences a porter reads. */
export class WidthTableError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'WidthTableError';
  }
}

/** The port's typical width when a profile is started, mm: a street intake port is about 30-34 mm across. */
export const TYPICAL_PORT_WIDTH_MM = 32;
/** The port's typical width in the document's units (32 mm, or 1.26 in). */
export const typicalPortWidth = (units: Units): number => (units === 'mm' ? TYPICAL_PORT_WIDTH_MM : 1.26);

/** A valve stem's usual diameter when none is known, mm (a street intake valve's stem). */
const STEM_MM = 8;

const text = (value: number, units: Units) => `${boxText(value, units)} ${lengthLabel(units)}`;

/** The profile a porter starts from: the typical width at the manifold face (along 0) and at the seat. */
export function startProfile(seatAlong: number, units: Units): WidthProfile {
  const width = typicalPortWidth(units);
  const end = seatAlong > 0 ? seatAlong : 10 * width;
  return { stations: [{ along: 0, width }, { along: end, width }] };
}

export type StationField = 'along' | 'width';

/** Station `index` with `field` set to `value`; refused when not a number, a width not above 0, or out of order. */
export function setStationValue(profile: WidthProfile, index: number, field: StationField, value: number, units: Units): WidthProfile {
  const station = profile.stations[index];
  if (!station) throw new WidthTableError(`There is no station ${index + 1}.`);
  if (!Number.isFinite(value)) throw new WidthTableError(`Type a number for the ${field === 'width' ? 'width' : 'distance along the port'}.`);
  const moved: WidthStation = { ...station, [field]: value };
  checkStation(profile.stations, index, moved, units);
  return { ...profile, stations: profile.stations.map((s, k) => (k === index ? moved : s)) };
}

/** Throws when `station` cannot stand at `index`: width above 0, along 0 or more and strictly between its neighbours. */
function checkStation(stations: readonly WidthStation[], index: number, station: WidthStation, units: Units): void {
  if (!(station.width > 0)) throw new WidthTableError(`A width must be more than 0 ${lengthLabel(units)}.`);
  if (station.width > MAX_PART_LENGTH) throw new WidthTableError(`A width can be at most ${text(MAX_PART_LENGTH, units)}.`);
  if (station.along > MAX_WIDTH_ALONG) throw new WidthTableError(`A station can lie at most ${text(MAX_WIDTH_ALONG, units)} along the port.`);
  if (station.along < 0) throw new WidthTableError('A station cannot lie ahead of the manifold face: its distance along the port must be 0 or more.');
  const before = stations[index - 1];
  const after = stations[index + 1];
  if (before && station.along <= before.along) {
    throw new WidthTableError(`Station ${index + 1} must lie farther along the port than station ${index} (${text(before.along, units)}).`);
  }
  if (after && station.along >= after.along) {
    throw new WidthTableError(`Station ${index + 1} must lie short of station ${index + 2} (${text(after.along, units)}).`);
  }
}

/**
 * Station `index` moved by a drag to (`along`, `width`): held between its neighbours (a hair inside, so the order
 * stays strict), at 0 or more along, and at a width of at least `minWidth`. Never throws.
 */
export function dragStation(profile: WidthProfile, index: number, along: number, width: number, minWidth: number): WidthProfile {
  const { stations } = profile;
  const before = stations[index - 1];
  const after = stations[index + 1];
  const gap = 1e-3 * Math.max(minWidth, 1e-9);
  const low = before ? before.along + gap : 0;
  const high = after ? after.along - gap : Infinity;
  const held: WidthStation = { along: Math.min(high, MAX_WIDTH_ALONG, Math.max(low, along)), width: Math.min(MAX_PART_LENGTH, Math.max(minWidth, width)) };
  return { ...profile, stations: stations.map((s, k) => (k === index ? held : s)) };
}

/** A station added halfway across the longest gap between two stations, at the width halfway between theirs. */
export function addStation(profile: WidthProfile): WidthProfile {
  const { stations } = profile;
  let gapAt = 0;
  for (let k = 1; k + 1 < stations.length; k++) {
    if (stations[k + 1].along - stations[k].along > stations[gapAt + 1].along - stations[gapAt].along) gapAt = k;
  }
  const [a, b] = [stations[gapAt], stations[gapAt + 1]];
  if (stations.length >= MAX_WIDTH_STATIONS) throw new WidthTableError(`A width profile holds at most ${MAX_WIDTH_STATIONS} stations.`);
  const added: WidthStation = { along: (a.along + b.along) / 2, width: (a.width + b.width) / 2 };
  return { ...profile, stations: [...stations.slice(0, gapAt + 1), added, ...stations.slice(gapAt + 1)] };
}

/** The profile without station `index`; refused when only two would be left. */
export function removeStation(profile: WidthProfile, index: number): WidthProfile {
  if (profile.stations.length <= 2) throw new WidthTableError('A width profile needs at least two stations.');
  return { ...profile, stations: profile.stations.filter((_, k) => k !== index) };
}

/** What the valve part offers an added obstruction: its stem diameter and the stretch of stem in the port. */
export interface ValveHint {
  /** Document units. */
  readonly stemDiameter: number;
  /** Along the valve axis up from the gauge-line centre, document units: the valve's back and the stem's drawn end. */
  readonly stemFrom: number;
  readonly stemTo: number;
}

/**
 * An obstruction added: the valve stem first (the valve's own stem where there is a valve part), then a guide boss
 * 1.75 times the stem's diameter on the upper half of the stem's stretch, then further ones named by number.
 */
export function addObstruction(profile: WidthProfile, units: Units, valve: ValveHint | null): WidthProfile {
  const list = profile.obstructions ?? [];
  const stem = valve?.stemDiameter ?? (units === 'mm' ? STEM_MM : STEM_MM / 25.4);
  const from = valve?.stemFrom ?? 0;
  const to = valve?.stemTo ?? 6 * stem;
  if (list.length >= MAX_WIDTH_OBSTRUCTIONS) throw new WidthTableError(`A width profile holds at most ${MAX_WIDTH_OBSTRUCTIONS} obstructions.`);
  const names = new Set(list.map((o) => o.name));
  let added: WidthObstruction;
  if (!names.has('valve stem')) added = { name: 'valve stem', diameter: stem, from, to };
  else if (!names.has('guide boss')) added = { name: 'guide boss', diameter: 1.75 * stem, from: (from + to) / 2, to };
  else added = { name: `obstruction ${list.length + 1}`, diameter: stem, from, to };
  return { ...profile, obstructions: [...list, added] };
}

/** The profile without obstruction `index`; the list is left out when it empties. */
export function removeObstruction(profile: WidthProfile, index: number): WidthProfile {
  const rest = (profile.obstructions ?? []).filter((_, k) => k !== index);
  const { obstructions: _, ...bare } = profile;
  return rest.length > 0 ? { ...bare, obstructions: rest } : bare;
}

export type ObstructionField = 'name' | 'diameter' | 'from' | 'to';

/** Obstruction `index` with `field` set; refused when a number is missing, the diameter not above 0, or to <= from. */
export function setObstructionValue(
  profile: WidthProfile, index: number, field: ObstructionField, value: number | string, units: Units,
): WidthProfile {
  const list = profile.obstructions ?? [];
  const old = list[index];
  if (!old) throw new WidthTableError(`There is no obstruction ${index + 1}.`);
  const changed: WidthObstruction = { ...old, [field]: typeof value === 'string' ? value.trim() : value };
  if (changed.name === '') throw new WidthTableError('An obstruction needs a name, such as valve stem or guide boss.');
  if (typeof value === 'number' && !Number.isFinite(value)) throw new WidthTableError(`Type a number for the obstruction's ${FIELD_WORDS[field]}.`);
  if (!(changed.diameter > 0)) throw new WidthTableError(`An obstruction's diameter must be more than 0 ${lengthLabel(units)}.`);
  if (changed.diameter > MAX_PART_LENGTH) throw new WidthTableError(`An obstruction's diameter can be at most ${text(MAX_PART_LENGTH, units)}.`);
  if (!(changed.to > changed.from)) {
    throw new WidthTableError(`The obstruction must end farther up the valve axis than it starts: "to" must be more than "from" (${text(changed.from, units)}).`);
  }
  return { ...profile, obstructions: list.map((o, k) => (k === index ? changed : o)) };
}

const FIELD_WORDS: Readonly<Record<ObstructionField, string>> = { name: 'name', diameter: 'diameter', from: 'start (from)', to: 'end (to)' };
