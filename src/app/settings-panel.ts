/** The settings panel (lil-gui) over the one settings object; tells the app which group changed. */
import GUI, { type Controller } from 'lil-gui';
import { CELLS_BY_DETAIL } from '../study/grid-detail.ts';
import { showRounded, type BoxUnit } from './box-precision.ts';
import type { AppSettings } from './settings.ts';
import { cellsText } from './solve-indicator.ts';

/** 'draw': colours, contours and layers; 'reference': what a speed ratio of 1 means (the field is scaled again). */
export type SettingsGroup = 'solve' | 'reading' | 'draw' | 'reference' | 'units' | 'edit';

export function buildSettingsPanel(host: HTMLElement, settings: AppSettings, onChange: (group: SettingsGroup) => void): GUI {
  const gui = new GUI({ container: host, title: 'Settings' });
  const solve = gui.addFolder('Solve');
  // Labels from the cell counts themselves, e.g. "standard (250k cells)".
  const details = Object.fromEntries(Object.entries(CELLS_BY_DETAIL).map(([detail, cells]) => [`${detail} (${cellsText(cells)})`, detail]));
  solve.add(settings, 'gridDetail', details)
    .name('grid detail').onFinishChange(() => onChange('solve'));
  solve.add(settings, 'units', { millimetres: 'mm', inches: 'inch' }).name('units').onFinishChange(() => onChange('units'));

  const draw = gui.addFolder('Colours and lines');
  draw.add(settings, 'reference', ['mean inlet speed', 'tightest station']).name('ratio of speed to').onFinishChange(() => onChange('reference'));
  draw.add(settings, 'colourMode', { 'automatic': 'auto', 'fixed (compare variants)': 'fixed' }).name('colour range').onFinishChange(() => onChange('draw'));
  rounded(draw.add(settings, 'colourMin', 0, 5, 0.05).name('fixed from').onFinishChange(() => onChange('draw')), 'ratio');
  rounded(draw.add(settings, 'colourMax', 0.1, 10, 0.05).name('fixed to').onFinishChange(() => onChange('draw')), 'ratio');
  draw.add(settings, 'contourLevels').name('contour levels').onFinishChange(() => onChange('draw'));
  draw.close();

  const layers = gui.addFolder('Layers');
  layers.add(settings.layers, 'field').name('speed field').onChange(() => onChange('draw'));
  layers.add(settings.layers, 'contours').name('contour lines').onChange(() => onChange('draw'));
  layers.add(settings.layers, 'streamlines').name('streamlines').onChange(() => onChange('draw'));
  layers.add(settings.layers, 'walls').name('walls').onChange(() => onChange('draw'));
  layers.add(settings.layers, 'flags').name('flags').onChange(() => onChange('draw'));
  layers.close();

  const reading = gui.addFolder('Flow reading');
  rounded(reading.add(settings, 'slowFraction', 0.05, 0.9, 0.05).name('slow below (of local mean)').onFinishChange(() => onChange('reading')), 'ratio');
  rounded(reading.add(settings, 'inletSpeedMs', 5, 300, 0.5).name('inlet speed, m/s').onFinishChange(() => onChange('reading')), 'm/s');
  reading.close();

  gui.add(settings, 'snapping').name('snap points').onChange(() => onChange('edit'));
  return gui;
}

/** Settings are not the document: a box shows its unit's rounding (e.g. a flow scale of 63.2456 m/s sent from the bench as 63.2). */
function rounded(controller: Controller, unit: BoxUnit): void {
  showRounded(controller, () => unit);
}
