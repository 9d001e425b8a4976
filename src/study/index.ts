/** One case pipeline shared by the app, the command and later the sweeps. */
export { caseSetup, type CaseModel, type CaseSetup, type CaseSpec } from './case-domain.ts';
export { solveFlattenTolerance } from './flatten-tolerance.ts';
export { WIDTH_MAP_CELLS } from './width-depth.ts';
export { solveCase, type SolvedCase } from './solve-case.ts';
export { CELLS_BY_DETAIL, DRAG_CELLS } from './grid-detail.ts';
export { StudyError, type StudyErrorCode } from './errors.ts';
export { missingEnds } from './open-ends.ts';
export { AXIS_WALL_NAME } from './axisymmetric-domain.ts';
