/** Brings the bench panel's form in line with the state: texts after unit switches, unit selects, messages, hints. */

import { areaUnitFor, formatQuantity } from '../../breathing/index.ts';
import { FIELD_KEYS, unitLabel } from './fields.ts';
import type { FormRefs } from './form.ts';
import { appValue, fieldProblems, REFERENCE_AREA_KEYS, type BenchPanelState, type FollowingField } from './model.ts';

/** `everyBox` rewrites the box being typed in too (the document changed under it: undo, another variant, a file). */
export function syncForm(refs: FormRefs, state: BenchPanelState, everyBox = false): void {
  const problems = fieldProblems(state);
  for (const key of FIELD_KEYS) {
    const f = refs.fields[key];
    const text = state.fields[key].text;
    // The field being typed in keeps its own caret; only other fields are rewritten.
    if (f.input.value !== text && (everyBox || f.input.ownerDocument.activeElement !== f.input)) f.input.value = text;
    const problem = problems[key] ?? '';
    f.error.textContent = problem;
    f.input.setAttribute('aria-invalid', problem ? 'true' : 'false');
    if (!(f.unit instanceof HTMLSelectElement)) f.unit.textContent = unitLabel(key, state.units);
  }
  for (const { quantity, select } of refs.unitSelects) select.value = state.units[quantity];
  refs.humidityModel.value = state.humidityModel;
  refs.referenceArea.value = state.referenceArea;
  refs.referenceHint.textContent = referenceHint(state);
  syncHint(refs, state, 'portArea');
  syncHint(refs, state, 'valveDiameter');
}

/** The area C_D is against, as the porter reads it, or that the app has none. */
function referenceHint(state: BenchPanelState): string {
  if (Object.values(state.areasM2).every((a) => a === undefined)) return 'no valve part: the discharge coefficient waits for one';
  const area = state.areasM2[REFERENCE_AREA_KEYS[state.referenceArea]];
  if (area === undefined) return `no ${state.referenceArea} area for this variant`;
  return `${formatQuantity('area', areaUnitFor(state.units.length), area)} at this lift, from the valve part`;
}

/** Under the port area and valve diameter: where the number came from, or a way back to the app's number. */
function syncHint(refs: FormRefs, state: BenchPanelState, key: FollowingField): void {
  const hint = refs.fields[key].hint;
  if (!hint) return;
  const doc = hint.ownerDocument;
  const app = appValue(state, key);
  const fromWhat = key === 'portArea' ? 'the section' : 'the valve part';
  if (app === null) {
    const text = key === 'portArea' ? 'no port area from the section: type it' : 'no valve part: type it for the Mach index';
    hint.textContent = state.follows[key] ? text : '';
    return;
  }
  if (state.follows[key]) {
    const source = key === 'portArea' && state.appPortArea?.source ? ` (${state.appPortArea.source})` : '';
    hint.textContent = `from ${fromWhat}${source}`;
    return;
  }
  const shown = key === 'portArea'
    ? formatQuantity('area', areaUnitFor(state.units.length), app)
    : formatQuantity('length', state.units.length, app);
  const button = doc.createElement('button');
  button.type = 'button';
  button.textContent = `use ${shown} from ${fromWhat}`;
  hint.replaceChildren(button);
}
