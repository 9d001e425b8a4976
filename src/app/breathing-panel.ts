/** Valve and seat numbers at the current lift, the greatest restriction, and notes against usual practice. */
import type { PortDocument } from '../document/types.ts';
import { metresPerUnit, partsBreathing, partsNotes } from '../parts/index.ts';
import type { mountBenchPanel } from './bench-panel.ts';
import { heading, readingTable, type ReadingRow } from './panel-table.ts';

export function showBreathing(host: HTMLElement, doc: PortDocument, tightestWidth: number | null): void {
  const parts = doc.variants.find((v) => v.name === doc.activeVariant)?.parts;
  if (!parts?.valve || !parts.seat) {
    host.replaceChildren();
    return;
  }
  const u = doc.units;
  const b = partsBreathing(parts, u, tightestWidth === null ? {} : { tightestWidth });
  if (!b) return host.replaceChildren();
  const len = (v: number) => `${v.toFixed(u === 'mm' ? 2 : 4)} ${u}`;
  const area = (v: number) => `${v.toFixed(u === 'mm' ? 1 : 4)} ${u}²`;
  const rows: ReadingRow[] = [
    ['lift, L/D', `${len(b.lift)}, ${b.ld.toFixed(3)}`],
    ['valve head area', area(b.headArea)],
    ['throat', `${len(b.throatDiameter)} (${b.throatPct.toFixed(1)}% of valve), ${area(b.throatArea)}`],
    ['curtain area (π D L)', area(b.curtainArea)],
    ['least valve flow area', `${area(b.minValveArea)} (stage ${b.stage})`],
    ...(b.port ? [[b.port.name, area(b.port.area)] as ReadingRow] : []),
    ['greatest restriction now', b.greatest, 'greatest'],
    ['valve stops restricting at', b.crossoverLift === null ? 'not within the lift range' : `${len(b.crossoverLift)} lift`],
  ];
  const notes = partsNotes(parts, u).map((n) => {
    const p = document.createElement('p');
    p.className = `part-note ${n.level}`;
    p.textContent = `${n.level === 'warn' ? 'Check: ' : 'Note: '}${n.message}`;
    return p;
  });
  host.replaceChildren(heading('Breathing at this lift'), readingTable(rows), ...notes);
}

/** Hands the bench calculator the active variant's areas in SI (it works out C_D and port speed against them). */
export function feedBench(bench: ReturnType<typeof mountBenchPanel>, doc: PortDocument, tightestWidth: number | null): void {
  const parts = doc.variants.find((v) => v.name === doc.activeVariant)?.parts;
  const b = parts ? partsBreathing(parts, doc.units, tightestWidth === null ? {} : { tightestWidth }) : null;
  const m2 = metresPerUnit(doc.units) ** 2;
  bench.setAreas(b ? { curtain: b.curtainArea * m2, throat: b.throatArea * m2, valveHead: b.headArea * m2 } : {});
  bench.setPortArea(b?.port ? b.port.area * m2 : null, b?.port?.source);
  bench.setLengthUnits(doc.units);
}
