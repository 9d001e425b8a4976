/** The one valve and seat the valve-area tests share: a 40 mm head on a 7 mm stem, 1.5 mm seat, 34 mm throat. */

import type { SeatCut, ValveHead } from '../../src/breathing/valve.ts';

/** Metres per millimetre and square metres per square millimetre. */
export const mm = 1e-3;
export const mm2 = 1e-6;

export const valve: ValveHead = { headDiameterM: 40 * mm, stemDiameterM: 7 * mm };

/** The 1.5 mm seat at `angleDeg` with a throat of `throatDiameterM` (34 mm unless given). */
export const seatAt = (angleDeg: number, throatDiameterM = 34 * mm): SeatCut => ({ angleDeg, widthM: 1.5 * mm, throatDiameterM });
