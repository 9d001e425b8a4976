/** The zod schema of a variant's bench inputs (format version 4): SI numbers within the panel's bounds, and its choices. */

import { z } from 'zod';
import { BENCH_BOUNDS, type BenchBound } from './limits.ts';

/** A number within `bound`, refused with a plain requirement: "must be a number above 0 and at most 1 (metres)". */
function benchNumber(bound: BenchBound) {
  const from = bound.aboveMin ? `above ${bound.min}` : `from ${bound.min}`;
  const to = bound.aboveMin ? `and at most ${bound.max}` : `to ${bound.max}`;
  const error = `must be ${bound.integer ? 'a whole number' : 'a number'} ${from} ${to} (${bound.unit})`;
  let n = z.number({ error });
  n = bound.aboveMin ? n.gt(bound.min, { error }) : n.min(bound.min, { error });
  n = n.max(bound.max, { error });
  return (bound.integer ? n.int({ error }) : n).optional();
}

const b = BENCH_BOUNDS;

/** Key order here is the order saveDocument writes: room air, bench, engine, then the choices. */
export const benchInputsSchema = z.strictObject(
  {
    airTemperatureK: benchNumber(b.airTemperatureK),
    barometricPressurePa: benchNumber(b.barometricPressurePa),
    relativeHumidityPct: benchNumber(b.relativeHumidityPct),
    testPressurePa: benchNumber(b.testPressurePa),
    measuredFlowM3PerS: benchNumber(b.measuredFlowM3PerS),
    boreM: benchNumber(b.boreM),
    strokeM: benchNumber(b.strokeM),
    engineSpeedRpm: benchNumber(b.engineSpeedRpm),
    cylinderCount: benchNumber(b.cylinderCount),
    portAreaM2: benchNumber(b.portAreaM2),
    valveDiameterM: benchNumber(b.valveDiameterM),
    meanFlowCoefficient: benchNumber(b.meanFlowCoefficient),
    hpPerCfm: benchNumber(b.hpPerCfm),
    humidityModel: z.enum(['cipm-2007', 'ideal-mixture'], { error: 'must be "cipm-2007" or "ideal-mixture"' }).optional(),
    referenceArea: z.enum(['curtain', 'throat', 'valve head'], { error: 'must be "curtain", "throat" or "valve head"' }).optional(),
    flowScale: z
      .enum(['ideal speed', 'bench flow / port area', 'mean port speed'], {
        error: 'must be "ideal speed", "bench flow / port area" or "mean port speed"',
      })
      .optional(),
  },
  { error: 'must be the bench inputs { airTemperatureK, testPressurePa, ... }' },
);

