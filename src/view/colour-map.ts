/**
 * The speed-ratio colour map: viridis, a perceptually uniform map (lightness rises steadily, readable in grey and by
 * most colour-blind viewers). Map by S. van der Walt and N. Smith (2015), released CC0 (public domain).
 * The 256 entries come from a published degree-6 polynomial fit of the viridis table by M. Zucconi, also released
 * CC0 ("matplotlib colormap polynomial fits", 2019). The coefficients below are recalled from memory, not re-read;
 * test/view/colour-map.test.ts checks them against the map's published end and middle colours.
 */

/** Polynomial coefficients c0..c6 per channel (r, g, b), lowest order first; t in 0..1. */
const VIRIDIS_FIT: readonly (readonly [number, number, number])[] = [
  [0.2777273272234177, 0.005407344544966578, 0.3340998053353061],
  [0.1050930431085774, 1.404613529898575, 1.384590162594685],
  [-0.3308618287255563, 0.214847559468213, 0.09509516302823659],
  [-4.634230498983486, -5.799100973351585, -19.33244095627987],
  [6.228269936347081, 14.17993336680509, 56.69055260068105],
  [4.776384997670288, -13.74514537774601, -65.35303263337234],
  [-5.435455855934631, 4.645852612178535, 26.3124352495832],
];

/** Number of entries in the colour-map texture. */
export const COLOUR_MAP_SIZE = 256;

/** Viridis at t (clamped to 0..1): sRGB components 0..1. */
export function viridis(t: number): [number, number, number] {
  const s = Math.min(1, Math.max(0, t));
  const out: [number, number, number] = [0, 0, 0];
  for (let ch = 0; ch < 3; ch++) {
    let acc = 0;
    // Horner from the highest order down.
    for (let k = VIRIDIS_FIT.length - 1; k >= 0; k--) acc = acc * s + VIRIDIS_FIT[k][ch];
    out[ch] = Math.min(1, Math.max(0, acc));
  }
  return out;
}

/**
 * The colour map as COLOUR_MAP_SIZE x 1 RGBA bytes (sRGB), entry k at t = k / (size - 1).
 * Layout: r, g, b, a per entry, a = 255.
 */
export function colourMapBytes(): Uint8Array {
  const bytes = new Uint8Array(COLOUR_MAP_SIZE * 4);
  for (let k = 0; k < COLOUR_MAP_SIZE; k++) {
    const [r, g, b] = viridis(k / (COLOUR_MAP_SIZE - 1));
    bytes[4 * k] = Math.round(r * 255);
    bytes[4 * k + 1] = Math.round(g * 255);
    bytes[4 * k + 2] = Math.round(b * 255);
    bytes[4 * k + 3] = 255;
  }
  return bytes;
}

/** CSS colour string of the map at t, for the colour bar and legends. */
export function colourCss(t: number): string {
  const [r, g, b] = viridis(t);
  return `rgb(${Math.round(r * 255)}, ${Math.round(g * 255)}, ${Math.round(b * 255)})`;
}
