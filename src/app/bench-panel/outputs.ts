/** The bench panel's results: room air and bench numbers, each by one call into src/breathing (SI in, units at the edge). */

import {
  areaUnitFor, dischargeCoefficient, flowInStandardAir, formatQuantity, idealSpeed, inH2OToPa, scaleFlowToTestPressure, speedOfSound,
  STANDARD_DENSITY_KGM3, sutherlandViscosity, testPressureFactor,
} from '../../breathing/index.ts';
import { REFERENCE_AREA_KEYS, type BenchPanelState, type FlowScaleSource } from './model.ts';
import { engineRows } from './engine.ts';
import { AIR_FIELDS, makeRow, roomAir, rowContext, scientific, type OutputRow, type RowContext } from './rows.ts';

/** Flows are compared at 28 in H2O, the trade's usual test pressure, Pa. */
const COMPARE_AT_PA = inH2OToPa(28);

const MODEL_NAMES = { 'cipm-2007': 'CIPM-2007 humid air', 'ideal-mixture': 'ideal mixture of dry air and vapour' } as const;

/** Every result row, in the order shown: air, bench, engine. */
export function benchOutputs(state: BenchPanelState): OutputRow[] {
  const ctx = rowContext(state);
  return [...airRows(ctx), ...benchRows(ctx), ...engineRows(ctx)];
}

function airRows(ctx: RowContext): OutputRow[] {
  const speed = ctx.state.units.speed;
  return [
    makeRow(ctx, { key: 'density', group: 'air', label: 'Air density' }, AIR_FIELDS, (v) => {
      const rho = roomAir(ctx, v).densityKgM3;
      return { valueSI: rho, text: `${rho.toFixed(4)} kg/m³`, note: MODEL_NAMES[ctx.state.humidityModel] };
    }),
    makeRow(ctx, { key: 'viscosity', group: 'air', label: 'Viscosity, dynamic' }, ['temperature'], (v) => {
      const mu = sutherlandViscosity(v.temperature);
      return { valueSI: mu, text: `${scientific(mu, 4)} Pa s`, note: 'Sutherland; humidity neglected' };
    }),
    makeRow(ctx, { key: 'kinematic', group: 'air', label: 'Viscosity, kinematic' }, AIR_FIELDS, (v) => {
      const nu = roomAir(ctx, v).kinematicViscosityM2S;
      return { valueSI: nu, text: `${scientific(nu, 4)} m²/s` };
    }),
    makeRow(ctx, { key: 'sound', group: 'air', label: 'Speed of sound' }, ['temperature'], (v) => {
      const a = speedOfSound(v.temperature);
      return { valueSI: a, text: formatQuantity('speed', speed, a), note: 'dry air' };
    }),
  ];
}

function benchRows(ctx: RowContext): OutputRow[] {
  const { units } = ctx.state;
  const flowText = (q: number): string => formatQuantity('flow', units.flow, q);
  const testShown = (pa: number): string => formatQuantity('pressure', units.pressure, pa, units.pressure === 'Pa' ? 0 : 1);
  return [
    makeRow(ctx, { key: 'ideal-speed', group: 'bench', label: 'Ideal speed at test pressure' }, [...AIR_FIELDS, 'testPressure'], (v) => {
      const u = idealSpeed(v.testPressure, roomAir(ctx, v).densityKgM3);
      return { valueSI: u, text: formatQuantity('speed', units.speed, u), note: `√(2 Δp / ρ) at ${testShown(v.testPressure)}` };
    }),
    // The bench flow spread over the port area: the mean speed the air really has there on the bench.
    makeRow(ctx, { key: 'bench-port-speed', group: 'bench', label: 'Bench flow / port area' }, ['flow', 'portArea'], (v) => {
      const u = v.flow / v.portArea;
      return { valueSI: u, text: formatQuantity('speed', units.speed, u), note: 'mean speed through the port area at the measured flow' };
    }),
    makeRow(ctx, { key: 'flow-28-sqrt', group: 'bench', label: 'Flow at 28 in H2O, square-root law' }, ['flow', 'testPressure'], (v) => {
      const q = scaleFlowToTestPressure(v.flow, v.testPressure, COMPARE_AT_PA, 'square-root');
      return { valueSI: q, text: flowText(q), note: `× ${testPressureFactor(v.testPressure, COMPARE_AT_PA).toFixed(4)}` };
    }),
    makeRow(ctx, { key: 'flow-28-comp', group: 'bench', label: 'Flow at 28 in H2O, compressible' }, ['flow', 'testPressure', 'barometric'], (v) => {
      const q = scaleFlowToTestPressure(v.flow, v.testPressure, COMPARE_AT_PA, 'compressible', v.barometric);
      const factor = v.flow > 0 ? ` × ${(q / v.flow).toFixed(4)};` : '';
      return { valueSI: q, text: flowText(q), note: `${factor} room air upstream at the barometric pressure` };
    }),
    makeRow(ctx, { key: 'flow-standard', group: 'bench', label: 'Flow in standard air' }, [...AIR_FIELDS, 'flow'], (v) => {
      const q = flowInStandardAir(v.flow, roomAir(ctx, v).densityKgM3);
      return { valueSI: q, text: flowText(q), note: `same head and test pressure in ${STANDARD_DENSITY_KGM3.toFixed(4)} kg/m³ air` };
    }),
    cdRow(ctx),
  ];
}

function cdRow(ctx: RowContext): OutputRow {
  const { referenceArea: kind, areasM2, units } = ctx.state;
  const head = { key: 'cd', group: 'bench', label: `Discharge coefficient C_D vs ${kind}` } as const;
  return makeRow(ctx, head, [...AIR_FIELDS, 'flow', 'testPressure'], (v) => {
    const area = areasM2[REFERENCE_AREA_KEYS[kind]];
    if (Object.values(areasM2).every((a) => a === undefined)) return 'no valve part';
    if (area === undefined) return `no ${kind} area for this variant`;
    const cd = dischargeCoefficient(v.flow, area, v.testPressure, roomAir(ctx, v).densityKgM3);
    const areaText = formatQuantity('area', areaUnitFor(units.length), area);
    const gross = kind === 'throat' ? ', gross (stem not taken off)' : '';
    return { valueSI: cd, text: cd.toFixed(3), note: `${kind} area ${areaText}${gross}, from the valve part` };
  });
}

const FLOW_SCALE_ROW: Readonly<Record<FlowScaleSource, string>> = {
  'ideal speed': 'ideal-speed',
  'bench flow / port area': 'bench-port-speed',
  'mean port speed': 'port-speed',
};

/** The speed "use as flow scale" sends, m/s, with what it is; null while it cannot be had. */
export function flowScaleSpeed(state: BenchPanelState): { readonly ms: number; readonly label: string } | null {
  const key = FLOW_SCALE_ROW[state.flowScale];
  const row = benchOutputs(state).find((r) => r.key === key);
  return row && row.valueSI !== null && row.valueSI > 0 ? { ms: row.valueSI, label: row.label } : null;
}
