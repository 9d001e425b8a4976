/** Public API of the geometry kernel: pure functions from section documents to flattened, checked flow domains. */

export { GeometryError, formatLength, formatPoint, outlineLabel, type GeometryErrorCode, type GeometryErrorDetail } from './errors.ts';
export { sectionToDomain } from './to-domain.ts';
export { sectionBounds, defaultTolerance, type Bounds } from './bounds.ts';
export { signedArea, regionArea } from './area.ts';
export { pointInRing, pointInRegion } from './region.ts';
export { cumulativeLengths, polylineLength, pointAtLength, slicePolyline, type PolylinePoint } from './arc-length.ts';
export { wallRuns, type WallRun } from './wall-runs.ts';
export { flattenEdge, type FlatEdge } from './flatten-edge.ts';
export { edgePath, type EdgePath, type EdgePlace, type PathPolyline } from './edge-path.ts';
export { arcThroughPoints, type CircleArc } from './circle-arc.ts';
export { cornerFillet, lineCornerFillet, largestFilletRadius, filletPoints, type CornerFillet } from './fillet.ts';
export { solvePathFillet, type PathFillet } from './fillet-solve.ts';
export { findCrossing, segmentIntersection, type Crossing, type CrossingRing } from './crossings.ts';
