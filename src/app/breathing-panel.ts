/** Valve and seat numbers at the current lift, the greatest restriction, and notes against usual practice. */
import { areaLabel, lengthLabel } from '../breathing/units.ts';
import type { PortDocument, Units } from '../document/types.ts';
import { activeVariant } from '../editor/index.ts';
import { metresPerUnit, partsBreathing, partsNotes, type PartsBreathing } from '../parts/index.ts';
import type { mountBenchPanel } from './bench-panel/panel.ts';
import { heading, readingTable, type ReadingRow } from './panel-table.ts';
import { endSentence } from './status.ts';

type BenchPanel = ReturnType<typeof mountBenchPanel>;

/**
 * Shows the active variant's breathing numbers and hands the bench calculator its areas, from one computation.
 * The port area ranked is the least area the last full solve found under the variant's width profile
 * (`solvedLeastArea`, document units squared), else a measured one; a round port guessed from the 2D width is never
 * ranked, it would decide the crossover on a guess (the headless command does the same).
 */
export function showPartsNumbers(host: HTMLElement, bench: BenchPanel, doc: PortDocument, solvedLeastArea?: number): void {
  const parts = activeVariant(doc).parts;
  const b = parts?.valve && parts.seat ? partsBreathing(parts, doc.units, { solvedLeastArea }) : null;
  feedBench(bench, doc, b);
  if (!parts || !b) return host.replaceChildren();
  const notes = partsNotes(parts, doc.units).map((n) => {
    const p = document.createElement('p');
    p.className = `part-note ${n.level}`;
    p.textContent = endSentence(`${n.level === 'warn' ? 'Check: ' : 'Note: '}${n.message}`);
    return p;
  });
  host.replaceChildren(heading('Breathing at this lift'), readingTable(breathingRows(b, doc.units)), ...notes);
}

function breathingRows(b: PartsBreathing, u: Units): ReadingRow[] {
  const len = (v: number) => `${v.toFixed(u === 'mm' ? 2 : 4)} ${lengthLabel(u)}`;
  const area = (v: number) => `${v.toFixed(u === 'mm' ? 1 : 4)} ${areaLabel(u)}`;
  return [
    ['lift, L/D', `${len(b.lift)}, ${b.ld.toFixed(3)}`],
    ['valve head area', area(b.headArea)],
    ['throat', `${len(b.throatDiameter)} (${b.throatPct.toFixed(1)}% of valve), ${area(b.throatArea)}`],
    ['curtain area (π D L)', area(b.curtainArea)],
    ['least valve flow area', `${area(b.minValveArea)} (stage ${b.stage})`],
    ...(b.port ? [[b.port.name, area(b.port.area)] as ReadingRow] : []),
    ['greatest restriction now', b.greatest, 'greatest'],
    ['valve stops restricting at', b.crossoverLift === null ? 'not within the lift range' : `${len(b.crossoverLift)} lift`],
  ];
}

/** The bench calculator works in SI: areas converted from the document's units. */
function feedBench(bench: BenchPanel, doc: PortDocument, b: PartsBreathing | null): void {
  const m2 = metresPerUnit(doc.units) ** 2;
  bench.setAreas(b ? { curtain: b.curtainArea * m2, throat: b.throatArea * m2, valveHead: b.headArea * m2 } : {});
  bench.setPortArea(b?.port ? b.port.area * m2 : null, b?.port?.source);
  bench.setLengthUnits(doc.units);
}
