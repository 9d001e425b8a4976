/** The bench panel's engine results: piston and port speed, inlet Mach index, the rule-of-thumb power estimate. */

import {
  areaUnitFor, estimatePower, formatQuantity, inletMachIndex, MACH_INDEX_KNEE, meanPistonSpeed, meanPortSpeed, speedOfSound,
} from '../../breathing/index.ts';
import { makeRow, type OutputRow, type RowContext } from './rows.ts';

/** Where the port area came from, said under the port speed. */
function portAreaNote(ctx: RowContext, areaM2: number): string {
  const { state } = ctx;
  const shown = formatQuantity('area', areaUnitFor(state.units.length), areaM2);
  if (!state.follows.portArea || !state.appPortArea) return `through ${shown} as typed`;
  return `through ${shown} from the section${state.appPortArea.source ? ` (${state.appPortArea.source})` : ''}`;
}

export function engineRows(ctx: RowContext): OutputRow[] {
  const speed = ctx.state.units.speed;
  return [
    makeRow(ctx, { key: 'piston-speed', group: 'engine', label: 'Mean piston speed' }, ['stroke', 'rpm'], (v) => {
      const sp = meanPistonSpeed(v.stroke, v.rpm);
      return { valueSI: sp, text: formatQuantity('speed', speed, sp), note: '2 × stroke × rev/s' };
    }),
    makeRow(ctx, { key: 'port-speed', group: 'engine', label: 'Mean port speed' }, ['bore', 'stroke', 'rpm', 'portArea'], (v) => {
      const vp = meanPortSpeed(v.bore, v.stroke, v.rpm, v.portArea);
      return { valueSI: vp, text: formatQuantity('speed', speed, vp), note: portAreaNote(ctx, v.portArea) };
    }),
    machRow(ctx),
    powerRow(ctx),
  ];
}

/**
 * Where the knee comes from, as a reader cites it. The 0.6 was recalled from memory, not read from the book again;
 * the tests and README say so, the screen names the work.
 */
export const MACH_INDEX_SOURCE = 'C. F. Taylor, The Internal-Combustion Engine in Theory and Practice, vol. 1, 2nd ed., 1985';

function machRow(ctx: RowContext): OutputRow {
  const head = { key: 'mach-index', group: 'engine', label: 'Inlet Mach index Z' } as const;
  const needs = ['bore', 'valveDiameter', 'stroke', 'rpm', 'flowCoefficient', 'temperature'] as const;
  return makeRow(ctx, head, needs, (v) => {
    const z = inletMachIndex({
      boreM: v.bore,
      inletValveDiameterM: v.valveDiameter,
      meanPistonSpeedMps: meanPistonSpeed(v.stroke, v.rpm),
      meanFlowCoefficient: v.flowCoefficient,
      speedOfSoundMps: speedOfSound(v.temperature),
    });
    const over = z > MACH_INDEX_KNEE;
    const where = over ? 'past the' : 'below the';
    const note = `${where} ${MACH_INDEX_KNEE} knee, above which volumetric efficiency falls quickly (${MACH_INDEX_SOURCE})`;
    return { valueSI: z, text: z.toFixed(3), note, flag: over };
  });
}

function powerRow(ctx: RowContext): OutputRow {
  const head = { key: 'power', group: 'engine', label: 'Power estimate' } as const;
  return makeRow(ctx, head, ['flow', 'testPressure', 'cylinders', 'hpPerCfm'], (v) => {
    const p = estimatePower(v.flow, v.testPressure, v.cylinders, v.hpPerCfm);
    // The label names the rule; the numbers after it show the arithmetic for one cylinder.
    const sum = `${p.hpPerCfm} × ${p.cfmAt28.toFixed(1)} = ${p.hpPerCylinder.toFixed(1)} hp`;
    return { valueSI: p.powerW, text: `${p.horsepower.toFixed(0)} hp (${(p.powerW / 1000).toFixed(0)} kW)`, note: `${p.label} = ${sum}` };
  });
}
