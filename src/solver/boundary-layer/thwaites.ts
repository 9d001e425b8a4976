/** Thwaites' laminar integral method: momentum thickness, pressure-gradient parameter and the shape/shear fits. */

/** Thwaites' momentum-integral constant: theta^2 U^6 = 0.45 nu integral U^5 ds (Thwaites 1949). */
export const THWAITES_A = 0.45;
/** Exponent of U in the same integral. */
const THWAITES_B = 6;
/** lambda in stagnation flow U = K s: 0.45 / 6 (derived from the integral). */
export const STAGNATION_LAMBDA = THWAITES_A / THWAITES_B;

/**
 * Wall shear parameter l(lambda) = tau_w theta / (mu U), Cebeci & Bradshaw (1977) fits.
 * lambda is clamped to [-0.1, 0.1], the range of the fits.
 */
export function thwaitesShear(lambda: number): number {
  const x = clampLambda(lambda);
  if (x >= 0) return 0.22 + 1.57 * x - 1.8 * x * x;
  return 0.22 + 1.402 * x + (0.018 * x) / (0.107 + x);
}

/** Shape factor H = delta* / theta from lambda, Cebeci & Bradshaw (1977) fits; lambda clamped to [-0.1, 0.1]. */
export function thwaitesShapeFactor(lambda: number): number {
  const x = clampLambda(lambda);
  if (x >= 0) return 2.61 - 3.75 * x + 5.24 * x * x;
  return 2.088 + 0.0731 / (0.14 + x);
}

function clampLambda(lambda: number): number {
  return lambda > 0.1 ? 0.1 : lambda < -0.1 ? -0.1 : lambda;
}

/**
 * lambda where the fitted wall shear l vanishes: laminar separation, about -0.0898.
 * Found once by bisection on [-0.1, -0.08], where l changes sign exactly once.
 */
export const THWAITES_SEPARATION_LAMBDA: number = (() => {
  let lo = -0.1;
  let hi = -0.08;
  for (let k = 0; k < 60; k++) {
    const mid = 0.5 * (lo + hi);
    if (thwaitesShear(mid) > 0) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
})();

/**
 * Exact integral of U^5 over a segment where U runs linearly from u0 to u1 (m/s) over lengthM (m).
 * Equals lengthM (u0^6 - u1^6) / (6 (u0 - u1)), written as a sum so u0 = u1 needs no special case.
 * @returns m^6/s^5
 */
export function speedFifthIntegral(u0: number, u1: number, lengthM: number): number {
  const a2 = u0 * u0;
  const b2 = u1 * u1;
  const sum = a2 * a2 * u0 + a2 * a2 * u1 + a2 * u0 * b2 + a2 * b2 * u1 + u0 * b2 * b2 + b2 * b2 * u1;
  return (lengthM * sum) / 6;
}

/**
 * Thwaites' theta^2 at a point, m^2, from the running numerator
 * N = theta0^2 U0^6 + 0.45 nu integral U^5 ds (m^2 (m/s)^6) and the local speed.
 * `floorMs` keeps 1/U^6 finite where the edge speed is near zero.
 * A point with no upstream layer (N = 0) at a speed below the floor is a stagnation point: there theta^2 takes
 * its Hiemenz limit 0.075 nu / (dU/ds) when the flow accelerates away, else 0.
 */
export function thwaitesThetaSq(
  numerator: number,
  speedMs: number,
  gradientPerS: number,
  nuM2s: number,
  floorMs: number,
): number {
  if (numerator <= 0 && speedMs <= floorMs) {
    const hiemenz = gradientPerS > 0 ? (STAGNATION_LAMBDA * nuM2s) / gradientPerS : 0;
    return Number.isFinite(hiemenz) ? hiemenz : 0; // a vanishing gradient forms no layer yet
  }
  const u = Math.max(speedMs, floorMs);
  return numerator / u ** THWAITES_B;
}

/**
 * Momentum thickness on a flat plate (U constant) by Thwaites: theta = sqrt(0.45 nu x / U) = 0.671 x / sqrt(Re_x).
 * @returns m; 0 when runM or speedMs is 0
 */
export function thwaitesFlatPlateTheta(runM: number, speedMs: number, nuM2s: number): number {
  if (runM <= 0 || speedMs <= 0) return 0;
  return Math.sqrt((THWAITES_A * nuM2s * runM) / speedMs);
}
