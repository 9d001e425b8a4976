/** Plain successive over-relaxation on the solver's stencil: the baseline the multigrid solver is measured against. */
import { diagonalOf, type Stencil } from '../src/solver/assemble.ts';
import { residual } from '../src/solver/pcg/operator.ts';

export interface SorRun {
  readonly sweeps: number;
  /** Final ||b - A x|| / ||b||. */
  readonly residual: number;
  readonly converged: boolean;
  readonly ms: number;
}

/** How often (sweeps) the residual is measured; one extra operator application each time. */
const CHECK_EVERY = 25;

/**
 * Lexicographic SOR from x = 0 with a fixed factor omega, until the relative residual reaches `tolerance`
 * or `limitMs` passes (checked every CHECK_EVERY sweeps). `sweepCap` bounds the sweeps (for factor scans).
 * @param x padded vector (cell k at k + nx), zeroed and overwritten; @param b rhs, i + j * nx.
 */
export function sor(
  s: Stencil, b: Float64Array, bNorm: number, x: Float64Array, omega: number, tolerance: number, limitMs: number, sweepCap = Infinity,
): SorRun {
  const scratch = new Float64Array(b.length);
  const diag = denseDiagonal(s);
  x.fill(0);
  const start = performance.now();
  let sweeps = 0;
  let rel = 1;
  while (sweeps < sweepCap) {
    for (let n = 0; n < CHECK_EVERY && sweeps < sweepCap; n++, sweeps++) sweep(s, diag, b, x, omega);
    rel = residual(s, x, b, scratch) / bNorm;
    if (rel <= tolerance || performance.now() - start > limitMs) break;
  }
  return { sweeps, residual: rel, converged: rel <= tolerance, ms: performance.now() - start };
}

/** The stencil's diagonal as a dense array (1 in excluded cells, which SOR then keeps at 0). */
function denseDiagonal(s: Stencil): Float64Array {
  const { nx, ny, dirichlet } = s;
  const diag = new Float64Array(nx * ny);
  for (let k = 0; k < nx * ny; k++) diag[k] = diagonalOf(s, k, 0);
  for (let m = 0; m < dirichlet.cells.length; m++) diag[dirichlet.cells[m]] += dirichlet.coupling[m];
  for (let k = 0; k < nx * ny; k++) if (diag[k] === 0) diag[k] = 1;
  return diag;
}

function sweep(s: Stencil, diag: Float64Array, b: Float64Array, x: Float64Array, omega: number): void {
  const { nx, ny, faceX, faceY } = s;
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx;
    const rowX = rowK + j;
    for (let i = 0; i < nx; i++) {
      const k = rowK + i;
      const v = k + nx;
      const gs = (b[k] + faceX[rowX + i] * x[v - 1] + faceX[rowX + i + 1] * x[v + 1]
        + faceY[k] * x[v - nx] + faceY[k + nx] * x[v + nx]) / diag[k];
      x[v] += omega * (gs - x[v]);
    }
  }
}

/**
 * The classical optimum for a square of side L with Dirichlet edges, 2 / (1 + sin(pi h / L)), taking
 * L = spans * (longest grid side); walls (no-flux) lengthen the effective side, hence the scan over spans.
 */
export function sorFactor(nx: number, ny: number, spans: number): number {
  return 2 / (1 + Math.sin(Math.PI / (spans * Math.max(nx, ny))));
}
