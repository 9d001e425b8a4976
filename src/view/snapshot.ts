/** Composes the view's layers (WebGL picture, labels, colour bar) into one canvas, e.g. for a printed sheet. */

import { COLOUR_BAR } from './view-style.ts';

/**
 * One canvas the size of the label layer (the view in device px; mid-drag the WebGL picture is drawn smaller and is
 * scaled up to it, as on screen). Call in the same task as the render, while the WebGL drawing buffer still holds
 * the frame.
 */
export function composeSnapshot(
  picture: HTMLCanvasElement,
  labels: HTMLCanvasElement,
  colourBar: HTMLCanvasElement,
  pixelRatio: number,
): HTMLCanvasElement {
  const out = document.createElement('canvas');
  out.width = labels.width;
  out.height = labels.height;
  const ctx = out.getContext('2d');
  if (!ctx) throw new Error('This browser cannot draw 2D canvas images.');
  ctx.drawImage(picture, 0, 0, out.width, out.height);
  ctx.drawImage(labels, 0, 0);
  // The colour bar sits in the top right corner, COLOUR_BAR.margin CSS px in.
  const margin = Math.round(COLOUR_BAR.margin * pixelRatio);
  ctx.drawImage(colourBar, out.width - colourBar.width - margin, margin);
  return out;
}
