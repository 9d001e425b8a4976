import { describe, expect, it } from 'vitest';
import { GeometryError, formatLength, formatPoint, outlineLabel } from '../../src/geometry/errors.ts';

describe('GeometryError', () => {
  it('carries its code, message and place, and is an Error', () => {
    const err = new GeometryError('zero-length', 'Corners 2 and 3 are at the same place.', { where: [1, 2], vertexIndex: 1, edgeIndex: 1 });
    expect(err).toBeInstanceOf(Error);
    expect(err.name).toBe('GeometryError');
    expect(err.code).toBe('zero-length');
    expect(err.where).toEqual([1, 2]);
    expect(err.vertexIndex).toBe(1);
    expect(err.islandName).toBeUndefined();
  });
});

describe('message wording', () => {
  it('lengths: 3 significant digits, units label or "units"', () => {
    expect(formatLength(12, 'mm')).toBe('12 mm');
    expect(formatLength(8.4372)).toBe('8.44 units');
    expect(formatLength(0.0123456, 'inch')).toBe('0.0123 in');
  });

  it('"at most" figures round down so the stated radius really fits, but not below a value that is whole up to rounding', () => {
    expect(formatLength(5.7735, 'mm', 'down')).toBe('5.77 mm');
    expect(formatLength(8.499, 'mm', 'down')).toBe('8.49 mm');
    expect(formatLength(9.999999999999998, 'mm', 'down')).toBe('10 mm');
  });

  it('numbers too small for a decimal scale (found by the geometry fuzz) still read as numbers, not NaN', () => {
    expect(formatPoint([5e-324, -1], 'mm')).toBe('(5e-324, -1) mm');
    expect(formatLength(1.2345e-310, 'mm', 'down')).toBe('1.23e-310 mm');
  });

  it('points and outline labels', () => {
    expect(formatPoint([2, 1], 'mm')).toBe('(2, 1) mm');
    expect(formatPoint([12.34567, -0.5])).toBe('(12.35, -0.5) units');
    expect(outlineLabel()).toBe('the section outline');
    expect(outlineLabel('valve')).toBe('island "valve"');
  });
});
