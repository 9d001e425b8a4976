import fc from 'fast-check';
import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import {
  cfmToLps,
  cfmToM3s,
  formatIn,
  formatQuantity,
  fromSI,
  ftpsToMps,
  in2ToMm2,
  inchToMm,
  inH2OToPa,
  INCH_UNITS,
  lpsToCfm,
  lpsToM3s,
  m3sToCfm,
  m3sToLps,
  METRIC_UNITS,
  mm2ToIn2,
  mmToInch,
  mpsToFtps,
  paToInH2O,
  toSI,
  UNIT_TABLE,
  type Quantity,
} from '../../src/breathing/units.ts';
import { expectRelClose } from './close.ts';

describe('factors (NIST SP 811, appendix B)', () => {
  it('1 in H2O (conventional) = 249.0889 Pa; 1 ft^3/min = 4.719474e-4 m^3/s', () => {
    expect(inH2OToPa(1)).toBe(249.0889);
    expect(cfmToM3s(1)).toBe(4.719474e-4);
  });
  it('1 in = 25.4 mm and 1 ft/s = 0.3048 m/s exactly', () => {
    expect(inchToMm(1)).toBeCloseTo(25.4, 12);
    expect(ftpsToMps(1)).toBe(0.3048);
    expect(in2ToMm2(1)).toBeCloseTo(645.16, 10);
  });
});

describe('against mathjs units (mathjs 15, its built-in unit table)', () => {
  it('inch to mm', () => {
    expectRelClose(inchToMm(3.25), unit(3.25, 'inch').toNumber('mm'), 1e-14);
  });
  it('ft/s to m/s', () => {
    expectRelClose(ftpsToMps(350.1), unit(350.1, 'ft/s').toNumber('m/s'), 1e-14);
  });
  it('cfm (mathjs has no "cfm"; ft^3/min) to m^3/s, to NIST\'s seven digits', () => {
    expectRelClose(cfmToM3s(226.105), unit(226.105, 'ft^3/min').toNumber('m^3/s'), 1e-7);
  });
  it('in H2O (mathjs has mmH2O, conventional 9.80665 Pa; 1 in = 25.4 mm) to Pa', () => {
    expectRelClose(inH2OToPa(28), unit(28 * 25.4, 'mmH2O').toNumber('Pa'), 1e-7);
  });
  it('L/s to m^3/s and in^2 to mm^2', () => {
    expectRelClose(lpsToM3s(106.71), unit(106.71, 'L/s').toNumber('m^3/s'), 1e-14);
    expectRelClose(in2ToMm2(1.348), unit(1.348, 'in^2').toNumber('mm^2'), 1e-14);
  });
});

describe('round trips (property: any finite value comes back)', () => {
  const pairs: [string, (x: number) => number, (x: number) => number][] = [
    ['Pa / inH2O', inH2OToPa, paToInH2O],
    ['CFM / m^3/s', cfmToM3s, m3sToCfm],
    ['L/s / m^3/s', lpsToM3s, m3sToLps],
    ['CFM / L/s', cfmToLps, lpsToCfm],
    ['ft/s / m/s', ftpsToMps, mpsToFtps],
    ['inch / mm', inchToMm, mmToInch],
    ['in^2 / mm^2', in2ToMm2, mm2ToIn2],
  ];
  it.each(pairs)('%s', (_name, there, back) => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
        expect(Math.abs(back(there(x)) - x)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(x)));
      }),
    );
  });
  it('every display unit in the table round-trips through SI', () => {
    for (const quantity of Object.keys(UNIT_TABLE) as Quantity[]) {
      for (const u of Object.keys(UNIT_TABLE[quantity]) as never[]) {
        expectRelClose(fromSI(quantity, u, toSI(quantity, u, 12.34)), 12.34, 1e-14);
      }
    }
  });
});

describe('display', () => {
  it('prints value and label with the unit\'s own decimals', () => {
    expect(formatQuantity('flow', 'CFM', cfmToM3s(226.105))).toBe('226.1 CFM');
    expect(formatQuantity('pressure', 'inH2O', inH2OToPa(28))).toBe('28.0 in H2O');
    expect(formatQuantity('pressure', 'Pa', inH2OToPa(28))).toBe('6974 Pa');
    expect(formatQuantity('speed', 'ft/s', 106.71)).toBe('350 ft/s');
    expect(formatQuantity('speed', 'm/s', 106.71, 3)).toBe('106.710 m/s');
  });
  it('follows a unit system, area going with length', () => {
    expect(formatIn(INCH_UNITS, 'length', 0.0364)).toBe('1.433 in');
    expect(formatIn(METRIC_UNITS, 'length', 0.0364)).toBe('36.40 mm');
    expect(formatIn(METRIC_UNITS, 'area', 869.436e-6)).toBe('869.4 mm²');
    expect(formatIn(INCH_UNITS, 'area', 869.436e-6)).toBe('1.348 in²');
    expect(formatIn(METRIC_UNITS, 'flow', 0.10671)).toBe('106.7 L/s');
  });
  it('never prints NaN or a signed zero', () => {
    expect(formatQuantity('flow', 'CFM', Number.NaN)).toBe('— CFM');
    expect(formatQuantity('pressure', 'Pa', -0.2)).toBe('0 Pa');
  });
});
