/** Engine-side numbers a porter checks a port against: piston and port speed, inlet Mach index, a power estimate. */

import { R_DRY_AIR } from './air.ts';
import { GAMMA_AIR, testPressureFactor } from './bench.ts';
import { requireNonNegative, requirePositive } from './errors.ts';
import { inH2OToPa, m3sToCfm } from './units.ts';

/** Mean piston speed 2 S N, m/s, with N in rev/s (Heywood 1988, ch. 2). Example: S 90 mm, 6000 rpm -> 18.000 m/s. */
export function meanPistonSpeed(strokeM: number, rpm: number): number {
  requirePositive(strokeM, 'strokeM', 'Stroke');
  requireNonNegative(rpm, 'rpm', 'Engine speed');
  return (2 * strokeM * rpm) / 60;
}

/**
 * Mean gas speed in a port by continuity, m/s: (pi/4) B^2 * mean piston speed / A_port.
 * Example: B 100 mm, S 90 mm, 6000 rpm, 45 mm round port -> 88.889 m/s.
 */
export function meanPortSpeed(boreM: number, strokeM: number, rpm: number, portAreaM2: number): number {
  requirePositive(boreM, 'boreM', 'Bore');
  requirePositive(portAreaM2, 'portAreaM2', 'Port area');
  return ((Math.PI / 4) * boreM * boreM * meanPistonSpeed(strokeM, rpm)) / portAreaM2;
}

/** Speed of sound sqrt(gamma R T), m/s. Example: 288.15 K -> 340.294 m/s. */
export function speedOfSound(temperatureK: number, gamma = GAMMA_AIR, gasConstant = R_DRY_AIR): number {
  requirePositive(temperatureK, 'temperatureK', 'Air temperature (kelvin)');
  return Math.sqrt(gamma * gasConstant * temperatureK);
}

/** Inputs of the inlet Mach index. */
export interface MachIndexInputs {
  /** Bore B, m. */
  readonly boreM: number;
  /** Inlet valve head diameter D_i, m. */
  readonly inletValveDiameterM: number;
  /** Mean piston speed, m/s. */
  readonly meanPistonSpeedMps: number;
  /** Mean inlet flow coefficient C_i over the open period, based on valve head area (dimensionless). */
  readonly meanFlowCoefficient: number;
  /** Speed of sound of the inlet air, m/s. */
  readonly speedOfSoundMps: number;
}

/**
 * Inlet Mach index Z = (B/D_i)^2 * mean piston speed / (C_i * a)
 * (Livengood, Rogowski & Taylor, SAE Quarterly Transactions 6, 1952 — formula recalled from memory).
 */
export function inletMachIndex(z: MachIndexInputs): number {
  requirePositive(z.boreM, 'boreM', 'Bore');
  requirePositive(z.inletValveDiameterM, 'inletValveDiameterM', 'Inlet valve diameter');
  requireNonNegative(z.meanPistonSpeedMps, 'meanPistonSpeedMps', 'Mean piston speed');
  requirePositive(z.meanFlowCoefficient, 'meanFlowCoefficient', 'Mean inlet flow coefficient');
  requirePositive(z.speedOfSoundMps, 'speedOfSoundMps', 'Speed of sound');
  const ratio = z.boreM / z.inletValveDiameterM;
  return (ratio * ratio * z.meanPistonSpeedMps) / (z.meanFlowCoefficient * z.speedOfSoundMps);
}

/** Above about this Mach index volumetric efficiency falls quickly (Taylor; recalled from memory). */
export const MACH_INDEX_KNEE = 0.6;

/** Test pressure the power rule of thumb is quoted at: 28 in H2O, Pa. */
export const POWER_RULE_TEST_PRESSURE_PA = inH2OToPa(28);

/**
 * Default hp per CFM at 28 in H2O. Common practice, no formal source: about 0.25–0.27 for a good naturally
 * aspirated four-stroke. It is a setting, not a physical constant.
 */
export const DEFAULT_HP_PER_CFM = 0.26;

/** What the app prints beside the estimate, so nobody takes it for a measurement. */
export const label = 'Rule-of-thumb estimate (common practice, not a measurement): hp per cylinder ≈ k × CFM at 28 in H2O';

/** Mechanical horsepower in W (NIST SP 811: 7.456 999 E+02). */
export const W_PER_HP = 745.6999;

/** A power estimate, with its label attached. */
export interface PowerEstimate {
  /** Flow of one port carried to 28 in H2O, CFM. */
  readonly cfmAt28: number;
  /** The k used, hp per CFM. */
  readonly hpPerCfm: number;
  readonly hpPerCylinder: number;
  readonly horsepower: number;
  /** Same total in W. */
  readonly powerW: number;
  readonly label: string;
}

/**
 * Rule-of-thumb engine power from bench flow: hp per cylinder = k * CFM at 28 in H2O (common practice).
 * `flowM3s` is one port's flow at `testPressurePa`; it is carried to 28 in H2O by the square-root law first.
 */
export function estimatePower(
  flowM3s: number,
  testPressurePa: number,
  cylinders: number,
  hpPerCfm = DEFAULT_HP_PER_CFM,
): PowerEstimate {
  requireNonNegative(flowM3s, 'flowM3s', 'Port flow');
  requirePositive(cylinders, 'cylinders', 'Number of cylinders');
  requirePositive(hpPerCfm, 'hpPerCfm', 'Horsepower per CFM');
  const cfmAt28 = m3sToCfm(flowM3s * testPressureFactor(testPressurePa, POWER_RULE_TEST_PRESSURE_PA));
  const hpPerCylinder = hpPerCfm * cfmAt28;
  const horsepower = hpPerCylinder * cylinders;
  return { cfmAt28, hpPerCfm, hpPerCylinder, horsepower, powerW: horsepower * W_PER_HP, label };
}
