/** solve --json carries the valve and seat numbers of the variant at its lift. */
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';
import { REPO, captureIO } from './helpers.ts';

describe('solve --json breathing block', () => {
  it('gives the sample valve numbers in mm at its 10 mm lift', async () => {
    const io = captureIO();
    const code = await run(['solve', join(REPO, 'samples/street-tight-short-side.json'), '--json', '--cells', '20000'], io);
    expect(code).toBe(0);
    const b = JSON.parse(io.stdout.join('\n')).breathing;
    expect(b.valveDiameter).toBe(46);
    expect(b.lift).toBe(10);
    expect(b.ld).toBeCloseTo(10 / 46, 5);
    // Curtain area pi D L [derived, REFERENCES.md 3a]: pi * 46 * 10
    expect(b.curtainArea).toBeCloseTo(Math.PI * 460, 2);
    // Throat 91% of the valve (common practice): pi (0.91 * 46)^2 / 4
    expect(b.throatPct).toBeCloseTo(91, 6);
    expect(b.throatArea).toBeCloseTo((Math.PI * (0.91 * 46) ** 2) / 4, 2);
    expect(b.minValveArea).toBeLessThan(b.curtainArea);
    expect(b.greatest).toBe('valve');
    expect(b.crossoverLift).toBeGreaterThan(10);
  }, 60_000);
});
