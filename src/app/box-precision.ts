/** How finely a typed box shows a number of each unit: rounding for display only, never written back to the document. */
import type { Controller } from 'lil-gui';

/** The unit of a typed box: a length in the document's units, an angle, a percentage, a plain ratio or a speed. */
export type BoxUnit = 'mm' | 'inch' | 'deg' | 'percent' | 'ratio' | 'm/s';

/**
 * Decimals shown per unit. mm to 0.01 and in to 0.001: a caliper's reading (0.001 in is 0.025 mm), finer than a
 * tracing or a grinder holds. Degrees to 0.1: seat cutters come in whole and half degrees, so 0.1 shows any angle a
 * porter types. Percent to 0.1: 0.1% of a 46 mm valve is 0.05 mm of throat. Ratios (speed ratio, slow fraction) to
 * 0.01, the colour bar's own resolution. m/s to 0.1, as the bench panel shows a speed.
 */
export const BOX_DECIMALS: Readonly<Record<BoxUnit, number>> = { mm: 2, inch: 3, deg: 1, percent: 1, ratio: 2, 'm/s': 1 };

/** `value` rounded to its unit's decimals, e.g. roundForBox(79.55684742857143, 'mm') -> 79.56; never -0. */
export function roundForBox(value: number, unit: BoxUnit): number {
  if (!Number.isFinite(value)) return value;
  const rounded = Number(value.toFixed(BOX_DECIMALS[unit]));
  return rounded === 0 ? 0 : rounded;
}

/** The text a box shows for `value`: rounded, without trailing zeros ("79.56", "0.394", "10"); empty when not finite. */
export function boxText(value: number, unit: BoxUnit): string {
  return Number.isFinite(value) ? String(roundForBox(value, unit)) : '';
}

/**
 * What a committed box should write to the document, or null for nothing: the box still holds the document's value,
 * or the rounded value it showed (left as shown, or the shown text typed again), so display rounding never nudges the
 * document. Any other number is the porter's own and is written as typed.
 */
export function typedChange(typed: number, exact: number, unit: BoxUnit): number | null {
  if (!Number.isFinite(typed)) return null;
  if (typed === exact || typed === roundForBox(exact, unit)) return null;
  return typed;
}

/**
 * Makes a lil-gui number box show its value rounded to `unit()` while it is not being typed in (the value itself, and
 * what lil-gui writes while typing, are untouched). Returns the controller.
 */
export function showRounded(controller: Controller, unit: () => BoxUnit): Controller {
  const input = (controller as unknown as { $input?: HTMLInputElement }).$input;
  const update = controller.updateDisplay.bind(controller);
  controller.updateDisplay = () => {
    update();
    if (input && document.activeElement !== input) input.value = boxText(controller.getValue() as number, unit());
    return controller;
  };
  controller.updateDisplay();
  return controller;
}

