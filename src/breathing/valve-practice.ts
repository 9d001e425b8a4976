/** Rules of the trade about throat size and lift, returned as notes for the app to show (common practice, no formal source). */

import { liftOverDiameter, throatPercent, type SeatCut, type ValveHead } from './valve-areas.ts';

/** One remark for the porter. 'warn' asks for a second look before cutting; 'note' is advice. */
export interface PracticeNote {
  readonly level: 'note' | 'warn';
  /** Stable key so the app can group or hide a remark. */
  readonly code: 'throat-out-of-range' | 'throat-outside-usual' | 'throat-not-safe-choice' | 'lift-high';
  readonly message: string;
}

// Common practice for the seat throat as a share of the head diameter (REFERENCES.md 3a, [practice]).
/** Outside this band a seat of usual width hardly fits (too big) or the throat chokes the valve (too small). */
export const THROAT_PERCENT_LIMITS = { min: 85, max: 95 } as const;
/** The band most seats are cut in. */
export const THROAT_PERCENT_USUAL = { min: 88, max: 93 } as const;
/** The usual safe choice. */
export const THROAT_PERCENT_SAFE = { min: 90, max: 91 } as const;
/** Above this L/D the curtain is far bigger than the throat, so extra lift buys little flow (common practice). */
export const LIFT_OVER_DIAMETER_HIGH = 0.35;

const pct = (x: number): string => `${x.toFixed(1)}%`;

function throatNote(percent: number): PracticeNote | null {
  const { min: lo, max: hi } = THROAT_PERCENT_LIMITS;
  if (percent < lo || percent > hi) {
    const side = percent < lo ? 'small: the throat may choke the valve' : 'large: little room is left for a seat';
    return {
      level: 'warn',
      code: 'throat-out-of-range',
      message: `Throat is ${pct(percent)} of the valve, outside ${lo}–${hi}%; it is ${side}.`,
    };
  }
  const usual = THROAT_PERCENT_USUAL;
  if (percent < usual.min || percent > usual.max) {
    return {
      level: 'note',
      code: 'throat-outside-usual',
      message: `Throat is ${pct(percent)} of the valve; seats are usually cut with the throat at ${usual.min}–${usual.max}%.`,
    };
  }
  const safe = THROAT_PERCENT_SAFE;
  if (percent < safe.min || percent > safe.max) {
    return {
      level: 'note',
      code: 'throat-not-safe-choice',
      message: `Throat is ${pct(percent)} of the valve; ${safe.min}–${safe.max}% is the usual safe choice.`,
    };
  }
  return null;
}

/**
 * Remarks on a valve and seat, and on a lift if given (m). Empty when nothing stands out.
 * These are workshop rules of thumb, not physics: the app shows them as such.
 */
export function seatPracticeNotes(valve: ValveHead, seat: SeatCut, liftM?: number): PracticeNote[] {
  const notes: PracticeNote[] = [];
  const throat = throatNote(throatPercent(valve, seat));
  if (throat) notes.push(throat);
  if (liftM !== undefined) {
    const ld = liftOverDiameter(liftM, valve.headDiameterM);
    if (ld > LIFT_OVER_DIAMETER_HIGH) {
      notes.push({
        level: 'note',
        code: 'lift-high',
        message:
          `L/D is ${ld.toFixed(3)}, above ${LIFT_OVER_DIAMETER_HIGH}: extra lift usually adds little flow here. ` +
          'Check valve-to-piston clearance and spring travel before running this lift.',
      });
    }
  }
  return notes;
}
