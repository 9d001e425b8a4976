/** The stations' table under the readings, folded away: distance from the inlet, width across the section and area. */
import { areaLabel, lengthLabel } from '../breathing/units.ts';
import type { Units } from '../document/types.ts';
import type { FlowReading } from '../solver/reading/index.ts';

/**
 * A <details> (closed unless `open`) listing every station from the inlet down: distance and width in the document's length unit,
 * area in its area unit (per unit of depth in the plane model, where it equals the width). The least area ahead of
 * the valve is the row marked "least".
 */
export function stationAreas(reading: FlowReading, units: Units, open = false): HTMLDetailsElement {
  const length = lengthLabel(units);
  const area = reading.model === 'plane' ? `${areaLabel(units)} per ${length}` : areaLabel(units);
  const digits = units === 'mm' ? 1 : 3;
  const details = document.createElement('details');
  details.dataset.reading = 'station-areas';
  details.open = open;
  const summary = document.createElement('summary');
  summary.textContent = `Station areas (${reading.stations.length} stations)`;
  const table = document.createElement('table');
  const head = table.createTHead().insertRow();
  for (const text of [`from inlet, ${length}`, `width, ${length}`, `area, ${area}`]) {
    const th = document.createElement('th');
    th.textContent = text;
    th.style.textAlign = 'right';
    head.append(th);
  }
  const body = table.createTBody();
  reading.stations.forEach((s, k) => {
    const row = body.insertRow();
    const least = reading.tightest?.index === k;
    const texts = [s.distanceFromInlet.toFixed(digits), s.width.toFixed(digits), `${least ? 'least ' : ''}${Number(s.area.toPrecision(4))}`];
    for (const text of texts) {
      const cell = row.insertCell();
      cell.textContent = text;
      cell.style.textAlign = 'right';
    }
  });
  details.append(summary, table);
  return details;
}
