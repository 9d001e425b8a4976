/** Section files with a round (axisymmetric) model for the study tests, drawn as a porter would draw them. */

/**
 * A round pipe of radius R and length L drawn as its whole axial section, the rectangle [0, L] x [-R, R] in
 * millimetres (inlet at x = 0, outlet at x = L), marked round about the axis y = 0 (through the origin, pointing
 * along +x: an inclination of 90 degrees from straight down), keeping `keep` ('right' of +x is +y).
 */
export function pipeFile(lengthL: number, radiusR: number, keep: 'left' | 'right'): string {
  const section = {
    outline: {
      vertices: [{ at: [0, -radiusR] }, { at: [lengthL, -radiusR] }, { at: [lengthL, radiusR] }, { at: [0, radiusR] }],
      edges: [
        { kind: 'line', role: 'wall', wallName: 'pipe wall' },
        { kind: 'line', role: 'outlet' },
        { kind: 'line', role: 'wall', wallName: 'pipe wall' },
        { kind: 'line', role: 'inlet' },
      ],
    },
    islands: [],
  };
  const variant = { name: 'pipe', axisymmetric: { axis: { x: 0, y: 0, inclinationDeg: 90 }, keep }, section };
  return JSON.stringify({
    format: 'portwright-section', version: 5, title: 'Round pipe', units: 'mm', activeVariant: 'pipe',
    settings: { gridDetail: 'standard' }, variants: [variant],
  });
}
