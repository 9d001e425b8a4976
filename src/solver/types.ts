/** Data the solver takes and gives. Pure data: the solver imports nothing from the rest of the project. */

/** Boundary mark of a polyline segment. */
export const MARK_WALL = 0;
export const MARK_INLET = 1;
export const MARK_OUTLET = 2;
export type SegmentMark = typeof MARK_WALL | typeof MARK_INLET | typeof MARK_OUTLET;

/**
 * A closed polyline (the flattened outline or an island).
 * Segment k runs from point k to point (k + 1) mod n.
 */
export interface Ring {
  /** x0, y0, x1, y1, ... in length units (the document's). */
  readonly xy: Float64Array;
  /** Per segment: MARK_WALL, MARK_INLET or MARK_OUTLET. */
  readonly marks: Uint8Array;
  /** Per segment: index into FlowDomain.wallNames, or -1 for an unnamed wall / inlet / outlet. */
  readonly wallIds: Int32Array;
}

/**
 * The flow region: inside `outer`, outside every island.
 * `outer` is counter-clockwise and islands clockwise (the geometry kernel orients them).
 */
export interface FlowDomain {
  readonly outer: Ring;
  readonly islands: readonly Ring[];
  /** Names of walls, e.g. "short side"; islands' walls are named too. */
  readonly wallNames: readonly string[];
  /**
   * Passage depth b(x, y) normal to the section, so the solver solves div(b grad phi) = 0. Absent: unit depth
   * (the plane model, per unit depth). Plain data, so the domain can be structured-cloned into a worker.
   */
  readonly depth?: DepthModel;
}

/** How the passage depth b(x, y) > 0 is given (see src/solver/depth). */
export type DepthModel = AxisymmetricDepth | SampledDepth;

/**
 * Round passage about an axis in the section's plane: b = 2 pi r, r the distance from the axis line (length
 * units). The section must lie on one side of the axis; a wall on the axis carries no flux (b = 0 there).
 */
export interface AxisymmetricDepth {
  readonly kind: 'axisymmetric';
  /** A point on the axis (x, y) and its direction (dirX, dirY, any length but zero), length units. */
  readonly axis: { readonly x: number; readonly y: number; readonly dirX: number; readonly dirY: number };
}

/**
 * Depth given at the nodes of a regular lattice in domain coordinates, bilinear between them and held at the
 * edge value beyond the lattice. Node (i, j) lies at (x0 + i dx, y0 + j dy).
 */
export interface SampledDepth {
  readonly kind: 'sampled';
  readonly x0: number;
  readonly y0: number;
  /** Node spacing, length units, > 0. */
  readonly dx: number;
  readonly dy: number;
  /** Nodes along x and y, >= 1 each (1: constant that way). */
  readonly nx: number;
  readonly ny: number;
  /** Depth at each node, length units, > 0; row-major i + j * nx. */
  readonly values: Float64Array;
}

/**
 * Cut-cell grid. Cell (i, j) has centre (x0 + (i + 0.5) h, y0 + (j + 0.5) h); index i + j * nx.
 * Faces: x-face (i, j) lies between cells (i-1, j) and (i, j), index i + j * (nx + 1);
 * y-face (i, j) lies between cells (i, j-1) and (i, j), index i + j * nx.
 */
export interface CutGrid {
  readonly nx: number;
  readonly ny: number;
  /** Cell size, length units. */
  readonly h: number;
  readonly x0: number;
  readonly y0: number;
  /** Fluid area fraction per cell, 0..1, row-major i + j * nx. */
  readonly cellFraction: Float64Array;
  /** Open fraction of each x-face, 0..1, (nx + 1) * ny. */
  readonly openX: Float64Array;
  /** Open fraction of each y-face, 0..1, nx * (ny + 1). */
  readonly openY: Float64Array;
  /**
   * Dirichlet coupling per cell from inlet / outlet segments crossing it:
   * conductance (boundary length / normal distance from the cell centre, dimensionless in 2D; times the depth when
   * the domain has one) to phi = 1 (inlet) and phi = 0 (outlet).
   */
  readonly inletCoupling: Float64Array;
  readonly outletCoupling: Float64Array;
  /**
   * With a passage depth (FlowDomain.depth): each face's conductance, its open fraction times the depth at the face
   * midpoint (depth units), layouts as openX and openY; the couplings above then carry the depth at each inlet or
   * outlet piece's midpoint too. Absent: unit depth, the open fractions are the conductances.
   */
  readonly conductanceX?: Float64Array;
  readonly conductanceY?: Float64Array;
  /**
   * Cells with a nonzero inlet or outlet coupling, ascending (i + j * nx), when the maker of the grid knows them
   * (rasterise does). The solver then reads the couplings there only: most of the two coupling arrays is never
   * written, and the first read of a never-written page costs a page fault (about 30 ms per 8 MB measured).
   */
  readonly coupledCells?: Int32Array;
}

/**
 * A wall thinner than a grid cell, found where a cell held fluid on both sides of it (the cell kept its largest
 * piece; the wall is solved as a wall about one cell thick). One entry per wall name, at its thinnest place.
 */
export interface ThinWall {
  /** Centre of the cell where the wall is thinnest, length units. */
  readonly x: number;
  readonly y: number;
  /** The wall's name (FlowDomain.wallNames), or 'unnamed wall'. */
  readonly wallName: string;
  /** Least distance between the fluid on either side of the wall in those cells, length units (about its thickness). */
  readonly thickness: number;
  /** Number of cells where this wall split the fluid. */
  readonly cellCount: number;
  /** Target cells at which the grid spacing would be at most half the thickness (Infinity for a wall of no thickness). */
  readonly resolvingCells: number;
}

/** The cut-cell grid and the thin walls found while measuring it. */
export interface RasterGrid extends CutGrid {
  readonly thinWalls: readonly ThinWall[];
}

export interface SolveOptions {
  /** Target number of grid cells over the domain's bounding box. */
  readonly targetCells: number;
  /** Relative residual to stop at; default 1e-8. */
  readonly tolerance?: number;
  /** Iteration cap; default 200. */
  readonly maxIterations?: number;
  /** Previous potential to warm start from (any grid; interpolated). */
  readonly warmStart?: PotentialField;
  /** Called between iterations; return true to stop early (a newer request superseded this one). */
  readonly shouldStop?: () => boolean;
  /** Sample the wall speeds (SolveResult.walls); default true. False leaves walls empty, for a quick picture. */
  readonly wallSpeeds?: boolean;
}

/** A potential on a grid, for warm starts. */
export interface PotentialField {
  readonly nx: number;
  readonly ny: number;
  readonly h: number;
  readonly x0: number;
  readonly y0: number;
  /** potential, row-major i + j * nx; NaN outside the fluid. */
  readonly phi: Float64Array;
}

/** Speed-ratio samples along one named wall (or unnamed wall run) in ring order. */
export interface WallSpeeds {
  readonly name: string;
  /** Per sample: x, y, s (arc length from the wall's first point, length units), speed ratio. Flattened, 4 numbers a sample. */
  readonly samples: Float64Array;
}

export interface SolveResult {
  readonly grid: CutGrid;
  /** potential, 1 at inlet and 0 at outlet; NaN in solid cells; row-major i + j * nx. */
  readonly phi: Float64Array;
  /** cell-centre speed ratio (speed / mean inlet speed); NaN in solid cells; row-major i + j * nx. */
  readonly speedRatio: Float64Array;
  readonly iterations: number;
  /** Final relative residual ||r|| / ||b||. */
  readonly residual: number;
  /** Total flux per unit potential drop: per unit depth, or in depth units (length) when the domain has a depth. */
  readonly conductance: number;
  /** Worst |station flux - total| / total over equipotential stations. */
  readonly fluxImbalance: number;
  /** Mean inlet speed, potential units per length (flux / inlet length, or / inlet area with a depth) at a unit potential drop. */
  readonly inletMeanSpeed: number;
  readonly peak: { readonly speedRatio: number; readonly x: number; readonly y: number };
  readonly walls: readonly WallSpeeds[];
  /** Walls thinner than a grid cell, solved as about one cell thick (empty when there are none). */
  readonly thinWalls: readonly ThinWall[];
}
