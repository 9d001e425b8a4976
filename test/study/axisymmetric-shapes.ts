/** Section files with a round (axisymmetric) model for the study tests, drawn as a porter would draw them. */

/**
 * A round pipe of radius R and length L drawn as its whole axial section, the rectangle [0, L] x [-R, R] in
 * millimetres (inlet at x = 0, outlet at x = L), marked round about the axis y = 0 (through the origin, pointing
 * along +x: an inclination of 90 degrees from straight down), keeping `keep` ('right' of +x is +y). Another
 * inclination turns the whole drawing and its axis about the origin.
 */
export function pipeFile(lengthL: number, radiusR: number, keep: 'left' | 'right', inclinationDeg = 90): string {
  // Along the axis (the way a valve at this inclination opens) and across it to its right, as src/parts/frame.ts.
  const lean = (inclinationDeg * Math.PI) / 180;
  const at = (along: number, across: number) => [along * Math.sin(lean) + across * Math.cos(lean), -along * Math.cos(lean) + across * Math.sin(lean)];
  const section = {
    outline: {
      vertices: [{ at: at(0, -radiusR) }, { at: at(lengthL, -radiusR) }, { at: at(lengthL, radiusR) }, { at: at(0, radiusR) }],
      edges: [
        { kind: 'line', role: 'wall', wallName: 'pipe wall' },
        { kind: 'line', role: 'outlet' },
        { kind: 'line', role: 'wall', wallName: 'pipe wall' },
        { kind: 'line', role: 'inlet' },
      ],
    },
    islands: [],
  };
  const variant = { name: 'pipe', axisymmetric: { axis: { x: 0, y: 0, inclinationDeg }, keep }, section };
  return JSON.stringify({
    format: 'portwright-section', version: 5, title: 'Round pipe', units: 'mm', activeVariant: 'pipe',
    settings: { gridDetail: 'standard' }, variants: [variant],
  });
}
