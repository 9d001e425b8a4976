/** Typed boxes round for display only: the shown text per unit, and no write-back when the shown value is retyped. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BOX_DECIMALS, boxText, roundForBox, typedChange, type BoxUnit } from '../../src/app/box-precision.ts';

const UNITS = Object.keys(BOX_DECIMALS) as BoxUnit[];

describe('boxText', () => {
  it('shows the numbers the boxes used to show at their unit\'s precision, without trailing zeros', () => {
    expect(boxText(79.55684742857143, 'mm')).toBe('79.56');
    expect(boxText(11.3649, 'mm')).toBe('11.36');
    expect(boxText(0.3937007874015748, 'inch')).toBe('0.394');
    expect(boxText(10, 'mm')).toBe('10');
    expect(boxText(45.25, 'deg')).toBe('45.3');
    expect(boxText(90.94, 'percent')).toBe('90.9');
    expect(boxText(63.2456, 'm/s')).toBe('63.2');
    expect(boxText(0.349, 'ratio')).toBe('0.35');
  });

  it('never shows a signed zero, and shows nothing for a number that is not finite', () => {
    expect(boxText(-0.0001, 'mm')).toBe('0');
    expect(Object.is(roundForBox(-0.0001, 'inch'), 0)).toBe(true);
    expect(boxText(Number.NaN, 'mm')).toBe('');
  });
});

describe('typedChange', () => {
  it('writes nothing back for the document\'s value or its shown rounding, in every unit', () => {
    fc.assert(fc.property(
      fc.constantFrom(...UNITS),
      fc.double({ min: -1000, max: 1000, noNaN: true, noDefaultInfinity: true }),
      (unit, exact) => {
        expect(typedChange(exact, exact, unit)).toBeNull();
        expect(typedChange(roundForBox(exact, unit), exact, unit)).toBeNull();
        // What the box shows, typed back as text, is no change either.
        expect(typedChange(Number(boxText(exact, unit)), exact, unit)).toBeNull();
      },
    ), { seed: 1111, numRuns: 2000 });
  });

  it('sends any other number exactly as typed', () => {
    expect(typedChange(79.5, 79.55684742857143, 'mm')).toBe(79.5);
    expect(typedChange(79.557, 79.55684742857143, 'mm')).toBe(79.557);
    expect(typedChange(0.4, 0.3937007874015748, 'inch')).toBe(0.4);
    expect(typedChange(Number.NaN, 4, 'mm')).toBeNull();
  });
});
