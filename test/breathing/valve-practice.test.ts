// The bands checked here are common practice (REFERENCES.md 3a [practice]; 85-95 % and L/D 0.35 from the brief),
// not published values: the tests pin which band a throat falls in, not the wisdom of the band.
import { describe, expect, it } from 'vitest';
import { seatPracticeNotes, throatForPercent } from '../../src/breathing/valve.ts';
import { mm, seatAt, valve } from './valve-fixture.ts';

const seatWithThroat = (percent: number) => seatAt(45, throatForPercent(valve.headDiameterM, percent));
const codesAt = (percent: number, liftM?: number) =>
  seatPracticeNotes(valve, seatWithThroat(percent), liftM).map((n) => `${n.level}:${n.code}`);

describe('seat practice notes (common practice)', () => {
  it('90-91 % is the safe choice: nothing to say', () => {
    expect(codesAt(90.5)).toEqual([]);
    expect(codesAt(91)).toEqual([]);
  });

  it('inside 88-93 % but off 90-91 %: a note naming the safe choice', () => {
    expect(codesAt(89)).toEqual(['note:throat-not-safe-choice']);
    expect(codesAt(92.5)).toEqual(['note:throat-not-safe-choice']);
    expect(seatPracticeNotes(valve, seatWithThroat(89))[0].message).toContain('90–91%');
  });

  it('inside 85-95 % but outside 88-93 %: a note about the usual band', () => {
    expect(codesAt(86)).toEqual(['note:throat-outside-usual']);
    expect(codesAt(94)).toEqual(['note:throat-outside-usual']);
  });

  it('outside 85-95 %: a warning that says which way', () => {
    expect(codesAt(80)).toEqual(['warn:throat-out-of-range']);
    expect(codesAt(97)).toEqual(['warn:throat-out-of-range']);
    expect(seatPracticeNotes(valve, seatWithThroat(80))[0].message).toMatch(/small/);
    expect(seatPracticeNotes(valve, seatWithThroat(97))[0].message).toMatch(/large/);
  });

  it('L/D above 0.35 adds a note that asks for a clearance check', () => {
    expect(codesAt(91, 0.35 * 40 * mm)).toEqual([]);
    expect(codesAt(91, 0.36 * 40 * mm)).toEqual(['note:lift-high']);
    const [note] = seatPracticeNotes(valve, seatWithThroat(91), 16 * mm);
    expect(note.message).toContain('0.400');
    expect(note.message).toMatch(/valve-to-piston clearance/);
  });
});
