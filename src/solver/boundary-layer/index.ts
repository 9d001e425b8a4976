/** Public face of the boundary-layer methods: the wall march and the closed-form pieces it is built from. */

export { BoundaryLayerInputError, type BoundaryLayerInputProblem } from './errors.ts';
export {
  DEFAULT_INITIAL_RUN_M,
  DEFAULT_SHAPE_FACTOR_LIMIT,
  marchWall,
  type WallDetachment,
  type WallMarch,
  type WallMarchInput,
} from './march.ts';
export {
  STAGNATION_LAMBDA,
  THWAITES_SEPARATION_LAMBDA,
  thwaitesFlatPlateTheta,
  thwaitesShapeFactor,
  thwaitesShear,
} from './thwaites.ts';
export { michelTransitionReTheta } from './michel.ts';
export {
  headEntrainment,
  headH1,
  headShapeFactor,
  ludwiegTillmannCf,
  turbulentEquivalentRun,
  turbulentFlatPlateTheta,
} from './head-closure.ts';
export { stratfordLimit, stratfordSeparation } from './stratford.ts';
