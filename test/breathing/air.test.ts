import { describe, expect, it } from 'vitest';
import {
  airProperties,
  compressibilityFactor,
  dryAirDensity,
  enhancementFactor,
  humidAirDensity,
  humidAirDensityIdeal,
  kinematicViscosity,
  R_DRY_AIR,
  saturationVapourPressure,
  STANDARD_DENSITY_KGM3,
  sutherlandViscosity,
} from '../../src/breathing/air.ts';
import { BreathingInputError } from '../../src/breathing/errors.ts';
import { expectRoundsTo } from './close.ts';

const room20 = { temperatureK: 293.15, pressurePa: 101325, relativeHumidity: 0.5 };

describe('dry air', () => {
  it('gas constant is 8314.32 / 28.9644 (US Standard Atmosphere 1976)', () => {
    expectRoundsTo(8314.32 / 28.9644, R_DRY_AIR, 4);
  });

  it('standard sea-level air 288.15 K, 101325 Pa -> 1.2250 kg/m^3 (US Standard Atmosphere 1976; ISO 2533)', () => {
    expectRoundsTo(dryAirDensity(288.15, 101325), 1.225, 4);
    expectRoundsTo(STANDARD_DENSITY_KGM3, 1.225, 4);
  });

  it('20 C, 101325 Pa -> 1.20411 kg/m^3 (REFERENCES.md 4 [derived], ideal gas)', () => {
    expectRoundsTo(dryAirDensity(293.15, 101325), 1.20411, 5);
  });

  it('rejects a temperature at or below absolute zero', () => {
    expect(() => dryAirDensity(0, 101325)).toThrow(BreathingInputError);
    expect(() => dryAirDensity(-20, 101325)).toThrow(/Air temperature/);
  });
});

describe('humid air', () => {
  it('CIPM-2007: 20 C, 101325 Pa, 50 % RH -> 1.19931 kg/m^3 (Picard et al., Metrologia 45, 2008)', () => {
    expectRoundsTo(humidAirDensity(room20, 'cipm-2007'), 1.19931, 5);
    expect(humidAirDensity(room20)).toBe(humidAirDensity(room20, 'cipm-2007'));
  });

  it('ideal mixture (R_d 287.058, R_v 461.495): same air -> 1.19883 kg/m^3 (REFERENCES.md 4 [derived])', () => {
    expectRoundsTo(humidAirDensity(room20, 'ideal-mixture'), 1.19883, 5);
  });

  it('saturation vapour pressure at 20 C is 2339.3 Pa (IAPWS steam tables — value recalled from memory)', () => {
    expect(Math.abs(saturationVapourPressure(293.15) / 2339.3 - 1)).toBeLessThan(1e-4);
  });

  it('CIPM-2007 enhancement factor at 20 C, 101325 Pa: 1.00062 + 3.14e-8 p + 5.6e-7 t^2 = 1.004026 [derived by hand]', () => {
    expectRoundsTo(enhancementFactor(293.15, 101325), 1.004026, 6);
    // Z of room air sits a few parts in 10^4 below 1 (Picard et al., Metrologia 45, 2008) [derived: 0.99961].
    expectRoundsTo(compressibilityFactor(293.15, 101325, 0.01159), 0.99961, 5);
  });

  it('at 0 % RH both models fall back to dry air (their own gas constants)', () => {
    const dry = { ...room20, relativeHumidity: 0 };
    expectRoundsTo(humidAirDensityIdeal(dry), 101325 / (287.058 * 293.15), 12);
    // CIPM-2007 differs from the ideal gas only by its Z and molar mass: within 0.05 %.
    expect(Math.abs(humidAirDensity(dry) / dryAirDensity(293.15, 101325) - 1)).toBeLessThan(5e-4);
  });

  it('humid air is lighter than dry air at the same T and p', () => {
    expect(humidAirDensity(room20)).toBeLessThan(dryAirDensity(293.15, 101325));
  });

  it('rejects a relative humidity given in percent by mistake', () => {
    expect(() => humidAirDensity({ ...room20, relativeHumidity: 50 })).toThrow(/Relative humidity/);
  });
});

describe('viscosity', () => {
  // US Standard Atmosphere 1976, eq. 51 (Sutherland); values REFERENCES.md 4 [derived].
  const table: [number, number][] = [
    [273.15, 1.71608],
    [288.15, 1.78938],
    [293.15, 1.81341],
    [300, 1.846],
  ];
  it.each(table)('Sutherland at %f K -> %f e-5 Pa s', (T, mu) => {
    expectRoundsTo(sutherlandViscosity(T) * 1e5, mu, 5);
  });

  it('standard sea level 1.7894e-5 Pa s (US Standard Atmosphere 1976; ISO 2533)', () => {
    expectRoundsTo(sutherlandViscosity(288.15) * 1e5, 1.7894, 4);
  });

  it('kinematic viscosity of standard air is mu / rho, about 1.4607e-5 m^2/s [derived]', () => {
    expectRoundsTo(kinematicViscosity(288.15, STANDARD_DENSITY_KGM3) * 1e5, 1.4607, 4);
  });

  it('airProperties bundles the chosen density with Sutherland viscosity', () => {
    const p = airProperties(room20, 'ideal-mixture');
    expect(p.densityKgM3).toBe(humidAirDensityIdeal(room20));
    expect(p.viscosityPaS).toBe(sutherlandViscosity(293.15));
    expect(p.kinematicViscosityM2S).toBeCloseTo(p.viscosityPaS / p.densityKgM3, 18);
  });
});
