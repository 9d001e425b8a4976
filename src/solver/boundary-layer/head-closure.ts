/** Closure relations of Head's entrainment method and the Ludwieg–Tillmann skin friction. */

/** H1 on the thin-layer branch (H <= 1.6), Head 1958. */
function h1Thin(shapeFactor: number): number {
  return 3.3 + 0.8234 * (shapeFactor - 1.1) ** -1.287;
}

/** H1 on the thick-layer branch (H > 1.6), Head 1958. */
function h1Thick(shapeFactor: number): number {
  return 3.3 + 1.5501 * (shapeFactor - 0.6778) ** -3.064;
}

/**
 * Head's two branches miss each other by 0.022 at H = 1.6. We blend them over 1.55 <= H <= 1.65 with a smoothstep
 * weight, so H1(H) is continuous with a continuous slope and still strictly falling (the weight's slope times the
 * 0.02–0.08 gap stays well under the branches' own slope of about -5). Outside the blend each branch is untouched,
 * so Head's values at H = 1.4, 2.0 and 2.4 are kept exactly.
 */
export const H1_BLEND_LOW = 1.55;
export const H1_BLEND_HIGH = 1.65;
/** Lowest shape factor the inverse returns (H1 -> infinity as H -> 1.1). */
const H_MIN = 1.1 + 1e-9;
/** H1 never goes below 3.3 (H -> infinity); H(H1) is capped here instead. */
const H_MAX = 8;

/** Head's shape factor H1 = (delta - delta*) / theta as a function of H = delta* / theta (blended at 1.6). */
export function headH1(shapeFactor: number): number {
  const h = Math.min(Math.max(shapeFactor, H_MIN), H_MAX);
  if (h <= H1_BLEND_LOW) return h1Thin(h);
  if (h >= H1_BLEND_HIGH) return h1Thick(h);
  const t = (h - H1_BLEND_LOW) / (H1_BLEND_HIGH - H1_BLEND_LOW);
  const w = t * t * (3 - 2 * t);
  return (1 - w) * h1Thin(h) + w * h1Thick(h);
}

const H1_AT_BLEND_LOW = h1Thin(H1_BLEND_LOW);
const H1_AT_BLEND_HIGH = h1Thick(H1_BLEND_HIGH);
const H1_AT_H_MAX = h1Thick(H_MAX);

/**
 * Inverse of headH1: H from H1. Closed form on each branch; bisection inside the blend (H1 falls strictly there).
 * H1 at or below H1(H_MAX) returns H_MAX; very large H1 tends to 1.1.
 */
export function headShapeFactor(h1: number): number {
  if (!(h1 > H1_AT_H_MAX)) return H_MAX;
  if (h1 >= H1_AT_BLEND_LOW) return Math.max(1.1 + ((h1 - 3.3) / 0.8234) ** (-1 / 1.287), H_MIN);
  if (h1 <= H1_AT_BLEND_HIGH) return 0.6778 + ((h1 - 3.3) / 1.5501) ** (-1 / 3.064);
  let lo = H1_BLEND_LOW;
  let hi = H1_BLEND_HIGH;
  for (let k = 0; k < 50; k++) {
    const mid = 0.5 * (lo + hi);
    if (headH1(mid) > h1) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/** Head's entrainment function F(H1) = 0.0306 (H1 - 3)^-0.6169 (dimensionless entrainment rate). */
export function headEntrainment(h1: number): number {
  return 0.0306 * Math.max(h1 - 3, 1e-6) ** -0.6169;
}

/**
 * Skin-friction coefficient cf = tau_w / (0.5 rho U^2), Ludwieg & Tillmann (1949):
 * cf = 0.246 * 10^(-0.678 H) * Re_theta^-0.268. Example: H = 1.4, Re_theta = 1e4 gives 0.00234.
 */
export function ludwiegTillmannCf(shapeFactor: number, reTheta: number): number {
  return 0.246 * 10 ** (-0.678 * shapeFactor) * reTheta ** -0.268;
}

/** Turbulent flat-plate shape factor used for starting values and at transition (common practice). */
export const TURBULENT_START_SHAPE_FACTOR = 1.4;
/** 1 + 0.268: exponent of theta after integrating d theta/dx = cf/2 on a flat plate. */
const FLAT_PLATE_EXPONENT = 1.268;
/** cf/2 = FLAT_PLATE_C Re_theta^-0.268 at H = 1.4. */
const FLAT_PLATE_C = 0.123 * 10 ** (-0.678 * TURBULENT_START_SHAPE_FACTOR);

/**
 * Turbulent flat-plate momentum thickness from Ludwieg–Tillmann at H = 1.4, integrating d theta/dx = cf/2 from 0:
 * theta^1.268 = 1.268 * 0.123 * 10^(-0.949) * (U/nu)^-0.268 * x, i.e. theta = 0.04121 x Re_x^-0.2114.
 * @returns m; 0 for a zero run or speed
 */
export function turbulentFlatPlateTheta(runM: number, speedMs: number, nuM2s: number): number {
  if (runM <= 0 || speedMs <= 0) return 0;
  return (FLAT_PLATE_EXPONENT * FLAT_PLATE_C * runM * (speedMs / nuM2s) ** -0.268) ** (1 / FLAT_PLATE_EXPONENT);
}

/** Inverse of turbulentFlatPlateTheta: the flat-plate run, m, that grows momentum thickness thetaM at speedMs. */
export function turbulentEquivalentRun(thetaM: number, speedMs: number, nuM2s: number): number {
  if (thetaM <= 0 || speedMs <= 0) return 0;
  return (thetaM ** FLAT_PLATE_EXPONENT * (speedMs / nuM2s) ** 0.268) / (FLAT_PLATE_EXPONENT * FLAT_PLATE_C);
}
