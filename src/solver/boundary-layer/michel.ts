/** Michel's transition criterion: the momentum-thickness Reynolds number at which a laminar layer turns turbulent. */

/**
 * Re_theta at transition for a given Re_x (distance from the layer's origin), in the form
 * Re_theta,tr = 1.174 (1 + 22400 / Re_x) Re_x^0.46 (Michel 1951; Cebeci & Smith 1974).
 * Example: Re_x = 1e6 gives 1.174 * 1.0224 * 1e6^0.46 = 690.70.
 * @returns Infinity for Re_x <= 0 (no run yet, no transition)
 */
export function michelTransitionReTheta(reX: number): number {
  if (!(reX > 0)) return Infinity;
  return 1.174 * (1 + 22400 / reX) * reX ** 0.46;
}
