import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import { BENCH_BOUNDS, type BenchBound } from '../../src/document/limits.ts';
import type { BenchInputs, PortDocument } from '../../src/document/types.ts';
import { documentErrorOf } from './document-error.ts';

const compareText = readFileSync(new URL('../../samples/short-side-compare.json', import.meta.url), 'utf8');
const compare = (): PortDocument => loadDocument(compareText);

/** The comparison sample's text with its first variant's bench inputs replaced. */
function withBench(bench: unknown): string {
  const doc = JSON.parse(compareText);
  doc.variants[0].bench = bench;
  return JSON.stringify(doc);
}

describe('bench inputs in the file (format version 4)', () => {
  it('the comparison sample carries bench inputs for each variant, in SI', () => {
    const [tight, generous] = compare().variants;
    expect(tight.bench?.testPressurePa).toBeCloseTo(28 * 249.0889, 3); // 28 in H2O, NIST SP 811 inch of water at 4 °C [derived]
    expect(tight.bench?.airTemperatureK).toBe(293.15);
    expect(tight.bench?.measuredFlowM3PerS).toBeLessThan(generous.bench!.measuredFlowM3PerS!);
  });

  it('round-trips through save and load exactly, the grid detail with them', () => {
    const doc = compare();
    const fine = { ...doc, settings: { gridDetail: 'fine' as const } };
    expect(loadDocument(saveDocument(fine))).toStrictEqual(fine);
    expect(saveDocument(loadDocument(compareText))).toBe(compareText);
  });

  it('writes the bench before the section, so it is found at the top of a variant', () => {
    const text = saveDocument(compare());
    expect(text.indexOf('"bench"')).toBeLessThan(text.indexOf('"section"'));
  });

  it('takes any subset, an empty object included', () => {
    for (const bench of [{}, { testPressurePa: 6974.4892 }, { flowScale: 'mean port speed' }] as BenchInputs[]) {
      expect(loadDocument(withBench(bench)).variants[0].bench).toStrictEqual(bench);
    }
  });

  it.each(Object.entries(BENCH_BOUNDS))('%s takes its bounds and refuses beyond them, saying the unit', (key, b) => {
    const bound: BenchBound = b;
    const inside = bound.aboveMin ? [bound.max] : [bound.min, bound.max];
    for (const value of inside) expect(loadDocument(withBench({ [key]: value })).variants[0].bench).toEqual({ [key]: value });
    const below = bound.aboveMin ? bound.min : bound.min - 0.5;
    for (const value of [below, bound.max + 0.5]) {
      const { message } = documentErrorOf(() => loadDocument(withBench({ [key]: value })));
      expect(message).toContain(`variants[0].bench.${key}: must be a`);
      expect(message).toContain(`(${bound.unit})`);
      expect(message).toContain(`(got ${value})`);
    }
  });

  it('refuses a part of a cylinder, a text number and a display unit, naming each', () => {
    const message = documentErrorOf(() => loadDocument(withBench({ cylinderCount: 4.5, boreM: '86', testPressureInH2O: 28 }))).message;
    expect(message).toContain('variants[0].bench.cylinderCount: must be a whole number from 1 to 24 (cylinders) (got 4.5)');
    expect(message).toContain('variants[0].bench.boreM: must be a number above 0 and at most 1 (metres) (got "86")');
    expect(message).toContain('variants[0].bench.testPressureInH2O: is not a field');
  });

  it('refuses a choice the panel does not offer', () => {
    const message = documentErrorOf(() => loadDocument(withBench({ humidityModel: 'dry', referenceArea: 'seat' }))).message;
    expect(message).toContain('variants[0].bench.humidityModel: must be "cipm-2007" or "ideal-mixture" (got "dry")');
    expect(message).toContain('variants[0].bench.referenceArea: must be "curtain", "throat" or "valve head" (got "seat")');
  });

  it('refuses bench inputs that are not an object', () => {
    expect(documentErrorOf(() => loadDocument(withBench([28]))).message).toContain('variants[0].bench: must be the bench inputs');
  });
});
