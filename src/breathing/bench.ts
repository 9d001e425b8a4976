/** Flow-bench arithmetic: ideal speed and flow at a test pressure, test-pressure and standard-air corrections, C_D. */

import { R_DRY_AIR, STANDARD_DENSITY_KGM3, STANDARD_PRESSURE_PA, STANDARD_TEMPERATURE_K } from './air.ts';
import { BreathingInputError, requireNonNegative, requirePositive } from './errors.ts';
import { curtainArea, throatArea, valveHeadArea, type SeatCut, type ValveHead } from './valve-areas.ts';

/** Ratio of specific heats of air. */
export const GAMMA_AIR = 1.4;

/**
 * Throat-to-upstream pressure ratio at which a nozzle chokes, (2/(gamma+1))^(gamma/(gamma-1)).
 * Example: gamma 1.4 -> 0.528282 (Heywood 1988, App. C).
 */
export function criticalPressureRatio(gamma = GAMMA_AIR): number {
  if (!(gamma > 1)) throw new BreathingInputError('gamma', `Ratio of specific heats must be above 1 (got ${gamma}).`);
  return (2 / (gamma + 1)) ** (gamma / (gamma - 1));
}

/** Ideal (Bernoulli) speed sqrt(2 dp / rho), m/s. Example: 6974.489 Pa (28 in H2O), 1.225 kg/m^3 -> 106.710 m/s. */
export function idealSpeed(pressureDropPa: number, densityKgM3: number): number {
  requireNonNegative(pressureDropPa, 'pressureDropPa', 'Test pressure');
  return Math.sqrt((2 * pressureDropPa) / requirePositive(densityKgM3, 'densityKgM3', 'Air density'));
}

/** Incompressible volume flow through an effective area C_D A (m^2), m^3/s: Q = C_D A sqrt(2 dp / rho). */
export function flowThroughArea(cdAreaM2: number, pressureDropPa: number, densityKgM3: number): number {
  requireNonNegative(cdAreaM2, 'cdAreaM2', 'Effective flow area');
  return cdAreaM2 * idealSpeed(pressureDropPa, densityKgM3);
}

/** Square-root law: factor that takes a flow read at `fromPa` to `toPa`. 25 -> 28 in H2O: 1.058301. */
export function testPressureFactor(fromPa: number, toPa: number): number {
  requirePositive(fromPa, 'fromPa', 'Test pressure read at');
  requireNonNegative(toPa, 'toPa', 'Test pressure wanted');
  return Math.sqrt(toPa / fromPa);
}

/** Upstream (stagnation) state and gas of a nozzle. */
export interface NozzleGas {
  /** Upstream stagnation pressure, Pa. */
  readonly upstreamPressurePa: number;
  /** Upstream stagnation temperature, K. */
  readonly upstreamTemperatureK: number;
  /** Ratio of specific heats (1.4 for air). */
  readonly gamma?: number;
  /** Gas constant, J/(kg K) (287.0531 for dry air). */
  readonly gasConstant?: number;
}

/**
 * Isentropic mass flow through a fixed C_D A, kg/s (Heywood 1988, App. C, eqs. C.8 and C.9):
 * m = C_D A p0/sqrt(R T0) (pT/p0)^(1/g) sqrt(2g/(g-1) (1 - (pT/p0)^((g-1)/g))), choked below the critical ratio.
 */
export function nozzleMassFlow(cdAreaM2: number, gas: NozzleGas, throatPressurePa: number): number {
  requireNonNegative(cdAreaM2, 'cdAreaM2', 'Effective flow area');
  const g = gas.gamma ?? GAMMA_AIR;
  const R = gas.gasConstant ?? R_DRY_AIR;
  const p0 = requirePositive(gas.upstreamPressurePa, 'upstreamPressurePa', 'Upstream pressure');
  const T0 = requirePositive(gas.upstreamTemperatureK, 'upstreamTemperatureK', 'Upstream temperature');
  requireNonNegative(throatPressurePa, 'throatPressurePa', 'Downstream pressure');
  if (throatPressurePa > p0) {
    throw new BreathingInputError('throatPressurePa', 'Downstream pressure cannot be above upstream pressure.');
  }
  const r = Math.max(throatPressurePa / p0, criticalPressureRatio(g));
  const shape = r ** (1 / g) * Math.sqrt(((2 * g) / (g - 1)) * (1 - r ** ((g - 1) / g)));
  return ((cdAreaM2 * p0) / Math.sqrt(R * T0)) * shape;
}

/**
 * Volume flow at room density (m^3/s) through C_D A on a suction bench: room air upstream at `room`,
 * the test pressure (depression, Pa) below room on the downstream side, isentropic expansion to the throat.
 */
export function compressibleFlowThroughArea(cdAreaM2: number, depressionPa: number, room: NozzleGas): number {
  requireNonNegative(depressionPa, 'depressionPa', 'Test pressure');
  const R = room.gasConstant ?? R_DRY_AIR;
  const roomDensity = room.upstreamPressurePa / (R * room.upstreamTemperatureK);
  return nozzleMassFlow(cdAreaM2, room, room.upstreamPressurePa - depressionPa) / roomDensity;
}

/**
 * Test-pressure factor with compressibility, for a fixed C_D A. Convention (the one that gives 1.053816 for
 * 25 -> 28 in H2O): room air upstream at `roomPressurePa` (101325 by default), the depression taken on the
 * downstream side, flow compared as mass flow or, the same thing, as volume at room density. Temperature cancels.
 * (Blowing instead, room pressure downstream and the test pressure added upstream, gives 1.058021 by mass.)
 */
export function compressibleTestPressureFactor(
  fromPa: number,
  toPa: number,
  roomPressurePa = STANDARD_PRESSURE_PA,
  gamma = GAMMA_AIR,
): number {
  requirePositive(fromPa, 'fromPa', 'Test pressure read at');
  // Temperature cancels in the ratio; standard temperature stands in for the room's.
  const room: NozzleGas = { upstreamPressurePa: roomPressurePa, upstreamTemperatureK: STANDARD_TEMPERATURE_K, gamma };
  return nozzleMassFlow(1, room, roomPressurePa - toPa) / nozzleMassFlow(1, room, roomPressurePa - fromPa);
}

/** How to carry a flow reading to another test pressure. */
export type TestPressureModel = 'square-root' | 'compressible';

/** Flow (m^3/s) read at `fromPa` carried to `toPa`, by the square-root law or with compressibility. */
export function scaleFlowToTestPressure(
  flowM3s: number,
  fromPa: number,
  toPa: number,
  model: TestPressureModel = 'square-root',
  roomPressurePa = STANDARD_PRESSURE_PA,
): number {
  const factor =
    model === 'square-root' ? testPressureFactor(fromPa, toPa) : compressibleTestPressureFactor(fromPa, toPa, roomPressurePa);
  return flowM3s * factor;
}

/** The area a discharge coefficient is stated against. */
export type ReferenceArea = 'curtain' | 'throat' | 'valve head';

/** Reference area (m^2) of the chosen kind at a lift (m). The throat is gross (stem included), as usually quoted. */
export function referenceArea(kind: ReferenceArea, valve: ValveHead, seat: SeatCut, liftM: number): number {
  if (kind === 'curtain') return curtainArea(valve.headDiameterM, liftM);
  if (kind === 'throat') return throatArea(seat);
  return valveHeadArea(valve);
}

/**
 * Discharge coefficient: measured flow / ideal flow through the reference area (Heywood 1988, sec. 6.3.2).
 * Flow in m^3/s at the bench air density, reference area m^2, test pressure Pa.
 */
export function dischargeCoefficient(
  measuredFlowM3s: number,
  referenceAreaM2: number,
  pressureDropPa: number,
  densityKgM3: number,
): number {
  requireNonNegative(measuredFlowM3s, 'measuredFlowM3s', 'Measured flow');
  requirePositive(referenceAreaM2, 'referenceAreaM2', 'Reference area');
  requirePositive(pressureDropPa, 'pressureDropPa', 'Test pressure');
  return measuredFlowM3s / flowThroughArea(referenceAreaM2, pressureDropPa, densityKgM3);
}

/**
 * Flow the same head would pass in standard air (1.2250 kg/m^3) at the same test pressure, m^3/s:
 * Q_std = Q sqrt(rho / rho_std), because Q = C_D A sqrt(2 dp / rho) and C_D A is the head's own.
 * Use this to compare readings taken on different days.
 */
export function flowInStandardAir(flowM3s: number, densityKgM3: number): number {
  requirePositive(densityKgM3, 'densityKgM3', 'Air density');
  return flowM3s * Math.sqrt(densityKgM3 / STANDARD_DENSITY_KGM3);
}

/** The same mass flow stated as volume of standard air, m^3/s: Q rho / rho_std ("standard" flow). */
export function standardVolumeFlow(flowM3s: number, densityKgM3: number): number {
  requirePositive(densityKgM3, 'densityKgM3', 'Air density');
  return (flowM3s * densityKgM3) / STANDARD_DENSITY_KGM3;
}
