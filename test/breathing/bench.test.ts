import { describe, expect, it } from 'vitest';
import { dryAirDensity, STANDARD_DENSITY_KGM3 } from '../../src/breathing/air.ts';
import {
  compressibleFlowThroughArea,
  compressibleTestPressureFactor,
  criticalPressureRatio,
  dischargeCoefficient,
  flowInStandardAir,
  flowThroughArea,
  idealSpeed,
  nozzleMassFlow,
  referenceArea,
  scaleFlowToTestPressure,
  standardVolumeFlow,
  testPressureFactor,
} from '../../src/breathing/bench.ts';
import { BreathingInputError } from '../../src/breathing/errors.ts';
import { inH2OToPa, m3sToCfm, mpsToFtps } from '../../src/breathing/units.ts';
import { curtainArea, type SeatCut, type ValveHead } from '../../src/breathing/valve.ts';
import { expectRoundsTo } from './close.ts';

const in25 = inH2OToPa(25);
const in28 = inH2OToPa(28);
const in10 = inH2OToPa(10);

describe('test-pressure correction', () => {
  it('square-root law: 25 -> 28 in H2O is 1.058301, 10 -> 28 is 1.673320 (REFERENCES.md 3b [derived; practice])', () => {
    expectRoundsTo(testPressureFactor(in25, in28), 1.058301, 6);
    expectRoundsTo(testPressureFactor(in10, in28), 1.67332, 6);
  });

  it('compressible, fixed C_D A, 25 -> 28 in H2O is 1.053816 (REFERENCES.md 3b [derived], Heywood 1988 App. C)', () => {
    // Convention that reproduces it: room air upstream at 101325 Pa, depression on the downstream side.
    expectRoundsTo(compressibleTestPressureFactor(in25, in28), 1.053816, 6);
    expect(scaleFlowToTestPressure(0.1, in25, in28, 'compressible')).toBeCloseTo(0.1053816, 7);
    expect(scaleFlowToTestPressure(0.1, in25, in28)).toBeCloseTo(0.1058301, 7);
  });

  it('compressible factor tends to the square-root law as the depression becomes small [derived]', () => {
    const small = compressibleTestPressureFactor(10, 40);
    expect(Math.abs(small - 2)).toBeLessThan(1e-3);
  });
});

describe('nozzle flow (Heywood 1988, App. C)', () => {
  it('critical pressure ratio for gamma 1.4 is 0.528282 (REFERENCES.md 3b [derived])', () => {
    expectRoundsTo(criticalPressureRatio(1.4), 0.528282, 6);
  });

  it('mass flow stops rising below the critical ratio (choked)', () => {
    const room = { upstreamPressurePa: 101325, upstreamTemperatureK: 288.15 };
    const atCritical = nozzleMassFlow(1e-3, room, 101325 * criticalPressureRatio());
    expect(nozzleMassFlow(1e-3, room, 101325 * 0.3)).toBe(atCritical);
    expect(nozzleMassFlow(1e-3, room, 101325 * 0.6)).toBeLessThan(atCritical);
  });

  it('at 28 in H2O the compressible flow follows the expansion factor Y = 1 - 3 x / (4 gamma), x = dp/p0 [derived]', () => {
    // Series of the nozzle relation for a small drop; the next term is of order x^2 (under 1e-3 here).
    const room = { upstreamPressurePa: 101325, upstreamTemperatureK: 288.15 };
    const incompressible = flowThroughArea(1e-3, in28, dryAirDensity(288.15, 101325));
    const ratio = compressibleFlowThroughArea(1e-3, in28, room) / incompressible;
    const firstOrder = 1 - (3 * (in28 / 101325)) / (4 * 1.4);
    expect(Math.abs(ratio - firstOrder)).toBeLessThan(1e-3);
    expect(ratio).toBeLessThan(1);
  });

  it('rejects a downstream pressure above upstream', () => {
    expect(() => nozzleMassFlow(1e-3, { upstreamPressurePa: 1e5, upstreamTemperatureK: 300 }, 2e5)).toThrow(
      BreathingInputError,
    );
  });
});

describe('ideal speed and flow, rho = 1.225 kg/m^3 (REFERENCES.md 3b [derived])', () => {
  it('28 in H2O is 6974.489 Pa; ideal speed 106.710 m/s (350.10 ft/s); at 25 in 100.831 m/s', () => {
    expectRoundsTo(in28, 6974.489, 3);
    expectRoundsTo(idealSpeed(in28, 1.225), 106.71, 3);
    expectRoundsTo(mpsToFtps(idealSpeed(in28, 1.225)), 350.1, 2);
    expectRoundsTo(idealSpeed(in25, 1.225), 100.831, 3);
  });

  it('C_D A = 1000 mm^2 at 28 in H2O passes 226.105 CFM', () => {
    expectRoundsTo(m3sToCfm(flowThroughArea(1000e-6, in28, 1.225)), 226.105, 3);
  });
});

describe('discharge coefficient against a reference area (Heywood 1988 sec. 6.3.2)', () => {
  const valve: ValveHead = { headDiameterM: 0.04, stemDiameterM: 0.007 };
  const seat: SeatCut = { angleDeg: 45, widthM: 0.0015, throatDiameterM: 0.0364 };

  it('recovers the C_D of a flow made from a known C_D A [derived]', () => {
    const curtain = curtainArea(0.04, 0.008);
    const measured = flowThroughArea(0.62 * curtain, in28, 1.2);
    expect(dischargeCoefficient(measured, referenceArea('curtain', valve, seat, 0.008), in28, 1.2)).toBeCloseTo(0.62, 12);
  });

  it('the same flow gives a larger C_D against the smaller area', () => {
    const q = 0.1;
    const cd = (kind: 'curtain' | 'throat' | 'valve head') =>
      dischargeCoefficient(q, referenceArea(kind, valve, seat, 0.008), in28, 1.2);
    // curtain 1005 mm^2 < throat 1041 mm^2 < head 1257 mm^2 at 8 mm lift
    expect(cd('curtain')).toBeGreaterThan(cd('throat'));
    expect(cd('throat')).toBeGreaterThan(cd('valve head'));
  });
});

describe('standard air (1.2250 kg/m^3, US Standard Atmosphere 1976)', () => {
  const rho20 = dryAirDensity(293.15, 101325);

  it('same head, same test pressure: the C_D A found from either reading is the same [derived]', () => {
    const q = 0.1;
    const qStd = flowInStandardAir(q, rho20);
    expect(qStd / Math.sqrt((2 * in28) / STANDARD_DENSITY_KGM3)).toBeCloseTo(q / Math.sqrt((2 * in28) / rho20), 15);
    expect(qStd).toBeLessThan(q); // lighter room air flows more volume
  });

  it('same mass flow stated as standard volume scales with the density ratio', () => {
    expect(standardVolumeFlow(0.1, rho20)).toBeCloseTo((0.1 * rho20) / 1.225, 4);
    expect(standardVolumeFlow(0.1, STANDARD_DENSITY_KGM3)).toBe(0.1);
  });
});
