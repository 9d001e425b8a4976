/** Cell counts as the solve indicator and the grid-detail choices say them. */
import { describe, expect, it } from 'vitest';
import { cellsText } from '../../src/app/solve-indicator.ts';

describe('cells as text', () => {
  it('says thousands below a million and millions from one million up', () => {
    expect(cellsText(31_000)).toBe('31k cells');
    expect(cellsText(252_252)).toBe('252k cells');
    expect(cellsText(999_499)).toBe('999k cells');
    expect(cellsText(1_000_000)).toBe('1.0M cells');
    expect(cellsText(4_194_304)).toBe('4.2M cells');
  });
});
