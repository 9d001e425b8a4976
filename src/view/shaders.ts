/** GLSL for the field and the hatched flags (three.js ShaderMaterial; three adds the WebGL2 prelude). */

/** Passes the section position (x, y in section units) to the fragment stage. */
export const SECTION_VERTEX = /* glsl */ `
varying vec2 vSection;
void main() {
  vSection = position.xy;
  gl_Position = projectionMatrix * modelViewMatrix * vec4(position, 1.0);
}
`;

/**
 * Bilinear weights over the 2 x 2 cell centres around a section point, keeping only cells the mask marks 1.
 * Done by hand with texelFetch (textures use NEAREST) so that solid cells never bleed into the fluid: the value is
 * the weighted mean of fluid neighbours only, and the covered weight says how far inside the fluid the point is.
 * Float textures are not filterable in WebGL2 without an extension, which is a second reason to do it here.
 */
const MASKED_BILINEAR = /* glsl */ `
uniform vec2 uGridOrigin;
uniform float uCellSize;
uniform ivec2 uGridSize;

// Returns (covered weight, weighted value sum).
vec2 maskedBilinear(sampler2D mask, sampler2D values, vec2 section, bool useValues) {
  vec2 g = (section - uGridOrigin) / uCellSize - 0.5;
  vec2 base = floor(g);
  vec2 f = g - base;
  ivec2 b = ivec2(base);
  vec2 acc = vec2(0.0);
  for (int dj = 0; dj < 2; dj++) {
    for (int di = 0; di < 2; di++) {
      ivec2 c = b + ivec2(di, dj);
      if (c.x < 0 || c.y < 0 || c.x >= uGridSize.x || c.y >= uGridSize.y) continue;
      float w = (di == 0 ? 1.0 - f.x : f.x) * (dj == 0 ? 1.0 - f.y : f.y);
      float m = texelFetch(mask, c, 0).r;
      acc.x += w * m;
      if (useValues) acc.y += w * m * texelFetch(values, c, 0).r;
    }
  }
  return acc;
}
`;

/** Speed ratio -> colour through the 256 x 1 map; the range is a uniform so rescaling never re-uploads the field. */
export const FIELD_FRAGMENT = /* glsl */ `
uniform sampler2D uValues;
uniform sampler2D uMask;
uniform sampler2D uColourMap;
uniform vec2 uRange;
uniform float uCoverageCut;
varying vec2 vSection;
${MASKED_BILINEAR}
uniform bool uNearest;
void main() {
  float v;
  // While a point is dragged: one cell per pixel (two fetches), falling back to the masked blend only at walls.
  ivec2 cell = clamp(ivec2(floor((vSection - uGridOrigin) / uCellSize)), ivec2(0), uGridSize - 1);
  if (uNearest && texelFetch(uMask, cell, 0).r > 0.5) {
    v = texelFetch(uValues, cell, 0).r;
  } else {
    vec2 acc = maskedBilinear(uMask, uValues, vSection, true);
    if (acc.x < uCoverageCut) discard;
    v = acc.y / acc.x;
  }
  float t = clamp((v - uRange.x) / (uRange.y - uRange.x), 0.0, 1.0);
  // Centre of texel k is at (k + 0.5) / 256: t = 0 and t = 1 land on the first and last entries exactly.
  vec3 colour = texture2D(uColourMap, vec2((t * 255.0 + 0.5) / 256.0, 0.5)).rgb;
  gl_FragColor = vec4(colour, 1.0);
  #include <colorspace_fragment>
}
`;

/**
 * Diagonal stripes fixed to the screen (not the section), so hatching keeps its spacing at every zoom.
 * With USE_CELL_MASK the stripes fill only cells the mask marks (a slow zone given per cell).
 */
export const HATCH_FRAGMENT = /* glsl */ `
uniform vec3 uColour;
uniform float uOpacity;
uniform float uSpacing;   // device px between stripe centres, along x
uniform float uHalfWidth; // device px, half the stripe width across it
varying vec2 vSection;
#ifdef USE_CELL_MASK
uniform sampler2D uMask;
${MASKED_BILINEAR}
#endif
void main() {
#ifdef USE_CELL_MASK
  if (maskedBilinear(uMask, uMask, vSection, false).x < 0.5) discard;
#endif
  float s = mod(gl_FragCoord.x + gl_FragCoord.y, uSpacing);
  float across = abs(s - 0.5 * uSpacing) * 0.70710678;
  float cover = clamp(uHalfWidth - across + 0.5, 0.0, 1.0);
  if (cover <= 0.0) discard;
  gl_FragColor = vec4(uColour, uOpacity * cover);
  #include <colorspace_fragment>
}
`;
