/** Air properties for the bench and the boundary layer: density (dry and humid) and viscosity from T, p and humidity. */

import { requirePositive, requireWithin } from './errors.ts';

/** Gas constant of dry air, J/(kg K): 8314.32 / 28.9644 (US Standard Atmosphere 1976). */
export const R_DRY_AIR = 287.0531;
/** Dry-air and water-vapour gas constants of the simple ideal-mixture model, J/(kg K). */
export const R_DRY_MIXTURE = 287.058;
export const R_VAPOUR_MIXTURE = 461.495;

/** Standard sea-level air (US Standard Atmosphere 1976; ISO 2533). */
export const STANDARD_TEMPERATURE_K = 288.15;
export const STANDARD_PRESSURE_PA = 101325;

/** Bench air conditions. */
export interface AirState {
  /** Room (upstream) temperature, K. */
  readonly temperatureK: number;
  /** Barometric (room) pressure, Pa. */
  readonly pressurePa: number;
  /** Relative humidity as a fraction, 0..1 (50 % is 0.5). */
  readonly relativeHumidity: number;
}

/** Which humid-air density formula to use. */
export type HumidAirModel = 'cipm-2007' | 'ideal-mixture';

function checkTp(temperatureK: number, pressurePa: number): void {
  requirePositive(temperatureK, 'temperatureK', 'Air temperature (kelvin)');
  requirePositive(pressurePa, 'pressurePa', 'Barometric pressure');
}

/** Dry-air density by the ideal-gas law, kg/m^3. Example: 293.15 K, 101325 Pa -> 1.20411. */
export function dryAirDensity(temperatureK: number, pressurePa: number): number {
  checkTp(temperatureK, pressurePa);
  return pressurePa / (R_DRY_AIR * temperatureK);
}

/** Density of standard sea-level air, kg/m^3 (1.2250). */
export const STANDARD_DENSITY_KGM3 = STANDARD_PRESSURE_PA / (R_DRY_AIR * STANDARD_TEMPERATURE_K);

// CIPM-2007 equation for the density of moist air: Picard, Davis, Glaeser & Fujii, Metrologia 45 (2008) 149-155.
const CIPM = {
  /** Molar gas constant, J/(mol K), as used by CIPM-2007. */
  R: 8.314472,
  /** Molar mass of water, kg/mol. */
  Mv: 18.01528e-3,
  /** Molar mass of dry air at 400 ppm CO2, kg/mol: (28.96546 + 12.011 (x_CO2 - 0.0004)) e-3. */
  Ma: 28.96546e-3,
  // Saturation vapour pressure over water: psv = exp(A T^2 + B T + C + D/T) Pa.
  A: 1.2378847e-5,
  B: -1.9121316e-2,
  C: 33.93711047,
  D: -6.3431645e3,
  // Enhancement factor f = alpha + beta p + gamma t^2 (t in deg C).
  alpha: 1.00062,
  beta: 3.14e-8,
  gamma: 5.6e-7,
  // Compressibility factor coefficients.
  a0: 1.58123e-6,
  a1: -2.9331e-8,
  a2: 1.1043e-10,
  b0: 5.707e-6,
  b1: -2.051e-8,
  c0: 1.9898e-4,
  c1: -2.376e-6,
  d: 1.83e-11,
  e: -0.765e-8,
} as const;

/** Saturation vapour pressure of water, Pa (CIPM-2007 formula, valid over liquid water near room temperature). */
export function saturationVapourPressure(temperatureK: number): number {
  requirePositive(temperatureK, 'temperatureK', 'Air temperature (kelvin)');
  const T = temperatureK;
  return Math.exp(CIPM.A * T * T + CIPM.B * T + CIPM.C + CIPM.D / T);
}

/** Enhancement factor f(p, t) of water vapour in air, dimensionless (CIPM-2007). */
export function enhancementFactor(temperatureK: number, pressurePa: number): number {
  const t = temperatureK - 273.15;
  return CIPM.alpha + CIPM.beta * pressurePa + CIPM.gamma * t * t;
}

/** Mole fraction of water vapour x_v = h f psv / p (CIPM-2007). */
export function vapourMoleFraction(air: AirState): number {
  const f = enhancementFactor(air.temperatureK, air.pressurePa);
  return (air.relativeHumidity * f * saturationVapourPressure(air.temperatureK)) / air.pressurePa;
}

/** Compressibility factor Z of moist air (CIPM-2007); about 0.9996 in a workshop. */
export function compressibilityFactor(temperatureK: number, pressurePa: number, vapourFraction: number): number {
  const T = temperatureK;
  const t = T - 273.15;
  const p = pressurePa;
  const xv = vapourFraction;
  const k = CIPM;
  const first = k.a0 + k.a1 * t + k.a2 * t * t + (k.b0 + k.b1 * t) * xv + (k.c0 + k.c1 * t) * xv * xv;
  return 1 - (p / T) * first + ((p * p) / (T * T)) * (k.d + k.e * xv * xv);
}

function checkAir(air: AirState): void {
  checkTp(air.temperatureK, air.pressurePa);
  requireWithin(air.relativeHumidity, 0, 1, 'relativeHumidity', 'Relative humidity (as a fraction)');
}

/** Humid-air density by CIPM-2007, kg/m^3. Example: 20 C, 101325 Pa, 50 % RH -> 1.19931. */
export function humidAirDensityCipm(air: AirState): number {
  checkAir(air);
  const xv = vapourMoleFraction(air);
  const Z = compressibilityFactor(air.temperatureK, air.pressurePa, xv);
  const { Ma, Mv, R } = CIPM;
  return ((air.pressurePa * Ma) / (Z * R * air.temperatureK)) * (1 - xv * (1 - Mv / Ma));
}

/**
 * Humid-air density as an ideal mixture of dry air and vapour, kg/m^3: p_d/(R_d T) + p_v/(R_v T),
 * with p_v = RH * psv (CIPM-2007 psv, no enhancement factor). Example: 20 C, 101325 Pa, 50 % RH -> 1.19883.
 */
export function humidAirDensityIdeal(air: AirState): number {
  checkAir(air);
  const pv = air.relativeHumidity * saturationVapourPressure(air.temperatureK);
  const pd = air.pressurePa - pv;
  return pd / (R_DRY_MIXTURE * air.temperatureK) + pv / (R_VAPOUR_MIXTURE * air.temperatureK);
}

/** Humid-air density, kg/m^3, by the chosen model (CIPM-2007 unless told otherwise). */
export function humidAirDensity(air: AirState, model: HumidAirModel = 'cipm-2007'): number {
  return model === 'cipm-2007' ? humidAirDensityCipm(air) : humidAirDensityIdeal(air);
}

/**
 * Dynamic viscosity of air by Sutherland's law, Pa s: 1.458e-6 T^1.5 / (T + 110.4)
 * (US Standard Atmosphere 1976, eq. 51). Example: 288.15 K -> 1.78938e-5. Humidity is neglected (under 1 % at room air).
 */
export function sutherlandViscosity(temperatureK: number): number {
  requirePositive(temperatureK, 'temperatureK', 'Air temperature (kelvin)');
  return (1.458e-6 * temperatureK ** 1.5) / (temperatureK + 110.4);
}

/** Kinematic viscosity nu = mu / rho, m^2/s. */
export function kinematicViscosity(temperatureK: number, densityKgM3: number): number {
  requirePositive(densityKgM3, 'densityKgM3', 'Air density');
  return sutherlandViscosity(temperatureK) / densityKgM3;
}

/** Everything the bench sheet and the boundary-layer march need from the room air. */
export interface AirProperties {
  /** kg/m^3 */
  readonly densityKgM3: number;
  /** Pa s */
  readonly viscosityPaS: number;
  /** m^2/s */
  readonly kinematicViscosityM2S: number;
}

/** Density and viscosity of the room air by the chosen humid-air model. */
export function airProperties(air: AirState, model: HumidAirModel = 'cipm-2007'): AirProperties {
  const densityKgM3 = humidAirDensity(air, model);
  const viscosityPaS = sutherlandViscosity(air.temperatureK);
  return { densityKgM3, viscosityPaS, kinematicViscosityM2S: viscosityPaS / densityKgM3 };
}
