/**
 * Remarks on the parts for the porter: the seat and lift rules from src/breathing, plus shrouding by the test bore
 * wall and a seat wider than the valve face. Data to show, never a refusal.
 */

import type { Parts, Units } from '../document/types.ts';
import { lengthLabel, seatPracticeNotes, type PracticeNote } from '../breathing/index.ts';
import { metresPerUnit, seatCutSI, valveHeadSI } from './si.ts';

export interface PartsNote {
  readonly level: 'note' | 'warn';
  readonly code: PracticeNote['code'] | 'valve-shrouded' | 'seat-wider-than-valve-face';
  readonly message: string;
}

/**
 * Below this share of the valve diameter between the valve edge and the bore wall, the wall shrouds the valve
 * (common practice, no formal source): a bench reads less flow on that side than the open chamber would give.
 */
export const SHROUD_CLEARANCE_SHARE = 0.1;

export interface PartsNoteOptions {
  /** Clearance below which the valve counts as shrouded, as a share of the valve diameter. */
  readonly shroudShare?: number;
}

/** Every remark on `parts`, in the order seat and lift, shrouding, seat width. Empty when nothing stands out. */
export function partsNotes(parts: Parts, units: Units, options: PartsNoteOptions = {}): PartsNote[] {
  const { valve, seat, bore } = parts;
  const label = lengthLabel(units);
  if (!valve) return [];
  const notes: PartsNote[] = [];
  if (seat) notes.push(...seatPracticeNotes(valveHeadSI(valve, units), seatCutSI(valve, seat, units), valve.lift * metresPerUnit(units)));
  const share = options.shroudShare ?? SHROUD_CLEARANCE_SHARE;
  const least = share * valve.diameter;
  if (bore && bore.valveEdgeToWall < least) {
    notes.push({
      level: 'warn',
      code: 'valve-shrouded',
      message:
        `The valve edge is ${fmt(bore.valveEdgeToWall)} ${label} from the bore wall, under ${share} x the valve diameter ` +
        `(${fmt(least)} ${label}; common practice): the wall shrouds that side of the valve, so the bench reads less flow there.`,
    });
  }
  if (seat && seat.seatWidth > valve.seatFaceWidth) {
    notes.push({
      level: 'warn',
      code: 'seat-wider-than-valve-face',
      message: `The seat (${fmt(seat.seatWidth)} ${label}) is wider than the valve's seat face (${fmt(valve.seatFaceWidth)} ${label}): the valve cannot cover it.`,
    });
  }
  return notes;
}

const fmt = (x: number): string => String(Math.round(x * 1000) / 1000);
