/** Typed error for wall samples or settings the boundary-layer march cannot use. */

export type BoundaryLayerInputProblem =
  | 'length-mismatch'
  | 'arc-not-increasing'
  | 'bad-speed'
  | 'bad-setting';

/** Thrown only for input that cannot describe a wall (never for a difficult but physical flow). */
export class BoundaryLayerInputError extends Error {
  override readonly name = 'BoundaryLayerInputError';
  constructor(
    readonly problem: BoundaryLayerInputProblem,
    message: string,
  ) {
    super(message);
  }
}
