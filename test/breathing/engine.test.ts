import { describe, expect, it } from 'vitest';
import {
  DEFAULT_HP_PER_CFM,
  estimatePower,
  inletMachIndex,
  label,
  meanPistonSpeed,
  meanPortSpeed,
  speedOfSound,
} from '../../src/breathing/engine.ts';
import { BreathingInputError } from '../../src/breathing/errors.ts';
import { cfmToM3s, inH2OToPa } from '../../src/breathing/units.ts';
import { circleArea } from '../../src/breathing/valve.ts';
import { expectRoundsTo } from './close.ts';

const mm = 1e-3;

describe('piston and port speed (Heywood 1988, ch. 2; REFERENCES.md 3c [derived] example)', () => {
  it('B 100 mm, S 90 mm, 6000 rpm -> 18.000 m/s mean piston speed', () => {
    expectRoundsTo(meanPistonSpeed(90 * mm, 6000), 18, 3);
  });

  it('45 mm round port -> 88.889 m/s mean port speed by continuity', () => {
    expectRoundsTo(meanPortSpeed(100 * mm, 90 * mm, 6000, circleArea(45 * mm)), 88.889, 3);
  });

  it('rejects a zero port area with a typed error', () => {
    expect(() => meanPortSpeed(100 * mm, 90 * mm, 6000, 0)).toThrow(BreathingInputError);
  });
});

describe('speed of sound and inlet Mach index', () => {
  it('sea-level speed of sound 340.294 m/s (US Standard Atmosphere 1976 — value recalled from memory)', () => {
    expectRoundsTo(speedOfSound(288.15), 340.294, 3);
  });

  it('Z = (B/D_i)^2 Sp / (C_i a) (Livengood, Rogowski & Taylor 1952 — formula from memory): hand value 0.74632', () => {
    const z = inletMachIndex({
      boreM: 100 * mm,
      inletValveDiameterM: 45 * mm,
      meanPistonSpeedMps: 18,
      meanFlowCoefficient: 0.35,
      speedOfSoundMps: speedOfSound(288.15),
    });
    expectRoundsTo(z, 0.74632, 5);
  });
});

// hp per CFM at 28 in H2O is common practice with no formal source (REFERENCES.md 3c [practice]):
// only the arithmetic is tested, with k a setting.
describe('rule-of-thumb power (common practice)', () => {
  it('250 CFM at 28 in H2O, default k 0.26, 8 cylinders -> 65 hp per cylinder, 520 hp', () => {
    expect(DEFAULT_HP_PER_CFM).toBe(0.26);
    const p = estimatePower(cfmToM3s(250), inH2OToPa(28), 8);
    expectRoundsTo(p.cfmAt28, 250, 9);
    expectRoundsTo(p.hpPerCylinder, 65, 9);
    expectRoundsTo(p.horsepower, 520, 9);
    expectRoundsTo(p.powerW / 1000, 387.764, 3); // 1 hp = 745.6999 W (NIST SP 811)
  });

  it('k is a setting: 0.25 gives 62.5 hp per cylinder', () => {
    expectRoundsTo(estimatePower(cfmToM3s(250), inH2OToPa(28), 1, 0.25).hpPerCylinder, 62.5, 9);
  });

  it('a reading at 25 in H2O is carried to 28 first by the square-root law', () => {
    const at25 = cfmToM3s(250 / Math.sqrt(28 / 25));
    expectRoundsTo(estimatePower(at25, inH2OToPa(25), 1).cfmAt28, 250, 9);
  });

  it('carries its label, which says it is common practice and not a measurement', () => {
    const p = estimatePower(cfmToM3s(200), inH2OToPa(28), 4);
    expect(p.label).toBe(label);
    expect(label).toMatch(/common practice/);
    expect(label).toMatch(/not a measurement/);
  });
});
