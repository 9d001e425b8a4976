/** Workshop remarks on the parts: throat band, L/D and shrouding (common practice, so the rules are marked so). */

import { describe, expect, it } from 'vitest';
import type { Parts } from '../../src/document/types.ts';
import { partsNotes, SHROUD_CLEARANCE_SHARE } from '../../src/parts/notes.ts';
import { BORE_80, PARTS_40, SEAT_91, VALVE_40 } from './helpers.ts';

const codes = (parts: Parts, options = {}) => partsNotes(parts, 'mm', options).map((n) => `${n.level} ${n.code}`);

describe('parts notes', () => {
  it('says nothing for a 91 % throat, L/D 0.2 and a valve 6 mm (0.15 D) from the bore wall', () => {
    expect(codes(PARTS_40)).toEqual([]);
  });

  it('warns for a throat outside 85-95 % of the valve, and notes one outside 88-93 % (common practice)', () => {
    // REFERENCES.md 3a [practice]: throat about 88-93 % of the valve, 90-91 % the usual safe choice.
    expect(codes({ ...PARTS_40, seat: { ...SEAT_91, throatPct: 84 } })).toEqual(['warn throat-out-of-range']);
    expect(codes({ ...PARTS_40, seat: { ...SEAT_91, throatPct: 95.5 } })).toEqual(['warn throat-out-of-range']);
    expect(codes({ ...PARTS_40, seat: { ...SEAT_91, throatPct: 86 } })).toEqual(['note throat-outside-usual']);
    expect(codes({ ...PARTS_40, seat: { ...SEAT_91, throatPct: 89 } })).toEqual(['note throat-not-safe-choice']);
  });

  it('notes an L/D above 0.35 (common practice), not at it', () => {
    expect(codes({ ...PARTS_40, valve: { ...VALVE_40, lift: 14.4 } })).toEqual(['note lift-high']); // L/D 0.36
    expect(codes({ ...PARTS_40, valve: { ...VALVE_40, lift: 14 } })).toEqual([]); // L/D 0.35
  });

  it('warns when the valve edge is closer to the bore wall than 0.1 D (common practice), and the share is a setting', () => {
    expect(SHROUD_CLEARANCE_SHARE).toBe(0.1);
    expect(codes({ ...PARTS_40, bore: { ...BORE_80, valveEdgeToWall: 3.9 } })).toEqual(['warn valve-shrouded']);
    expect(codes({ ...PARTS_40, bore: { ...BORE_80, valveEdgeToWall: 4 } })).toEqual([]);
    expect(codes(PARTS_40, { shroudShare: 0.2 })).toEqual(['warn valve-shrouded']);
    const [note] = partsNotes({ ...PARTS_40, bore: { ...BORE_80, valveEdgeToWall: 2 } }, 'mm');
    expect(note.message).toContain('2 mm from the bore wall, under 0.1 x the valve diameter (4 mm; common practice)');
  });

  it('warns when the seat is wider than the valve face that must cover it', () => {
    expect(codes({ ...PARTS_40, seat: { ...SEAT_91, seatWidth: 2.6 } })).toEqual(['warn seat-wider-than-valve-face']);
  });

  it('reads the same in inches: the rules are ratios', () => {
    const inch = 1 / 25.4;
    const parts: Parts = {
      valve: { ...VALVE_40, diameter: 40 * inch, seatFaceWidth: 2.5 * inch, lift: 15 * inch },
      seat: { ...SEAT_91, seatWidth: 1.5 * inch, throatPct: 84 },
      bore: { ...BORE_80, valveEdgeToWall: 3 * inch },
    };
    expect(partsNotes(parts, 'inch').map((n) => n.code)).toEqual(['throat-out-of-range', 'lift-high', 'valve-shrouded']);
    expect(partsNotes({ valve: VALVE_40 }, 'mm')).toEqual([]);
  });
});
