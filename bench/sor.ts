/**
 * The benchmark's baseline: red-black SOR over the fluid cells only, on the solver's own 5-point operator, with
 * the optimum factor of Young's theory from the Jacobi spectral radius measured on that operator.
 */
import { diagonalOf, type Stencil } from '../src/solver/assemble.ts';
import { buildMultigrid } from '../src/solver/multigrid/multigrid.ts';
import { pcg } from '../src/solver/pcg/pcg.ts';
import { paddedVector, residual } from '../src/solver/pcg/operator.ts';

export interface SorRun {
  readonly sweeps: number;
  /** Final ||b - A x|| / ||b||. */
  readonly residual: number;
  readonly converged: boolean;
  readonly ms: number;
}

/** How often (red-black sweep pairs) the true residual is measured; each check costs about one sweep. */
const CHECK_EVERY = 20;

/**
 * Precomputed data of the SOR sweep: the fluid runs of every row and the inverse diagonal.
 * runs: start, end (exclusive) column pairs of the active cells of row j at runs[2 runPtr[j]] ...; so solid
 * cells, inside a row's span or not, are never visited. invDiag: 1 / (face sum + coupling), i + j * nx.
 */
export interface SorPlan {
  readonly runs: Int32Array;
  readonly runPtr: Int32Array;
  readonly invDiag: Float64Array;
}

export function sorPlan(s: Stencil): SorPlan {
  const { nx, ny, active, dirichlet } = s;
  const runs: number[] = [];
  const runPtr = new Int32Array(ny + 1);
  const invDiag = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    let start = -1;
    for (let i = 0; i <= nx; i++) {
      const on = i < nx && active[i + j * nx] === 1;
      if (on && start < 0) start = i;
      if (!on && start >= 0) {
        runs.push(start, i);
        start = -1;
      }
      if (on) invDiag[i + j * nx] = 1 / diagonalOf(s, i + j * nx, 0);
    }
    runPtr[j + 1] = runs.length / 2;
  }
  for (let m = 0; m < dirichlet.cells.length; m++) {
    const k = dirichlet.cells[m];
    invDiag[k] = 1 / diagonalOf(s, k, dirichlet.coupling[m]);
  }
  return { runs: Int32Array.from(runs), runPtr, invDiag };
}

/**
 * Red-black SOR from x = 0 with a fixed factor omega, until the relative residual ||b - A x|| / ||b|| (the
 * MG-PCG stopping rule) reaches `tolerance` or `limitMs` passes (both checked every CHECK_EVERY sweep pairs).
 * @param x padded vector (cell k at k + nx), zeroed and overwritten; @param b rhs, i + j * nx.
 */
export function sor(s: Stencil, plan: SorPlan, b: Float64Array, bNorm: number, x: Float64Array, omega: number, tolerance: number, limitMs: number): SorRun {
  const scratch = new Float64Array(b.length);
  x.fill(0);
  const start = performance.now();
  let sweeps = 0;
  let rel = 1;
  for (;;) {
    for (let n = 0; n < CHECK_EVERY; n++, sweeps++) {
      sweepColour(s, plan, b, x, omega, 0);
      sweepColour(s, plan, b, x, omega, 1);
    }
    rel = residual(s, x, b, scratch) / bNorm;
    if (rel <= tolerance || performance.now() - start > limitMs) break;
  }
  return { sweeps, residual: rel, converged: rel <= tolerance, ms: performance.now() - start };
}

/** Over-relaxes the cells of one colour ((i + j) & 1) in every fluid run; Dirichlet couplings are in invDiag. */
function sweepColour(s: Stencil, plan: SorPlan, b: Float64Array, x: Float64Array, omega: number, colour: number): void {
  const { nx, ny, faceX, faceY } = s;
  const { runs, runPtr, invDiag } = plan;
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx;
    const rowX = rowK + j;
    for (let q = 2 * runPtr[j], qEnd = 2 * runPtr[j + 1]; q < qEnd; q += 2) {
      const first = runs[q];
      for (let i = first + ((first + j + colour) & 1), end = runs[q + 1]; i < end; i += 2) {
        const k = rowK + i;
        const v = k + nx;
        const gs = (b[k] + faceX[rowX + i] * x[v - 1] + faceX[rowX + i + 1] * x[v + 1] + faceY[k] * x[v - nx] + faceY[k + nx] * x[v + nx]) * invDiag[k];
        x[v] += omega * (gs - x[v]);
      }
    }
  }
}

/** How the Jacobi spectral radius was found, for the benchmark's output. */
export const SOR_FACTOR_METHOD =
  'omega = 2 / (1 + sqrt(1 - rhoJ^2)) (Young), rhoJ = 1 - mu_min of D^-1 A by inverse power iteration (MG-PCG solves) on the same operator';

export interface SorFactor {
  readonly omega: number;
  readonly rhoJ: number;
  /** Inverse power iterations done, and the last relative change of mu_min. */
  readonly iterations: number;
  readonly change: number;
}

/**
 * The optimum factor of red-black SOR. With red-black ordering the matrix is consistently ordered, so Young's
 * omega_opt = 2 / (1 + sqrt(1 - rhoJ^2)) holds, rhoJ the spectral radius of the Jacobi matrix I - D^-1 A.
 * Its spectrum is symmetric about 0 (red cells couple only to black ones), so rhoJ = 1 - mu_min, mu_min the least
 * eigenvalue of A y = mu D y. That is found by inverse power iteration: y <- A^-1 D y (each step an MG-PCG solve
 * to 1e-10), mu = y.A y / y.D y (Rayleigh quotient), until mu changes by less than 1e-7 relatively. Inverse
 * iteration converges at the ratio mu_min / mu_2, which does not depend on the grid, where plain power iteration
 * on the Jacobi matrix would need of the order of n^2 steps for n cells across.
 */
export function sorFactor(s: Stencil, plan: SorPlan): SorFactor {
  const { nx, ny } = s;
  const mg = buildMultigrid(s);
  const y = new Float64Array(nx * ny);
  const rhs = new Float64Array(nx * ny);
  const work = { p: paddedVector(nx, ny), z: paddedVector(nx, ny) };
  for (let k = 0; k < y.length; k++) y[k] = plan.invDiag[k] > 0 ? 1 : 0;
  let mu = Infinity;
  let change = Infinity;
  let iterations = 0;
  while (iterations < 30 && change > 1e-7) {
    let norm = 0;
    for (let k = 0; k < y.length; k++) {
      rhs[k] = y[k] / (plan.invDiag[k] || 1);
      norm += rhs[k] * rhs[k];
    }
    const x = new Float64Array(nx * ny);
    pcg(s, mg, x, rhs, Math.sqrt(norm), work, { tolerance: 1e-10, maxIterations: 200 });
    const next = rayleigh(s, plan, x, work.p);
    change = Math.abs(next - mu) / next;
    mu = next;
    let largest = 0;
    for (let k = 0; k < x.length; k++) largest = Math.max(largest, Math.abs(x[k]));
    for (let k = 0; k < x.length; k++) y[k] = x[k] / largest;
    iterations++;
  }
  const rhoJ = 1 - mu;
  return { omega: 2 / (1 + Math.sqrt(1 - rhoJ * rhoJ)), rhoJ, iterations, change };
}

/** y.A y / y.D y, y plain (i + j * nx); `padded` is scratch. */
function rayleigh(s: Stencil, plan: SorPlan, y: Float64Array, padded: Float64Array): number {
  const { nx } = s;
  padded.fill(0);
  padded.set(y, nx);
  const ay = new Float64Array(y.length);
  residual(s, padded, ay, ay); // ay = 0 - A y
  let yAy = 0;
  let yDy = 0;
  for (let k = 0; k < y.length; k++) {
    if (plan.invDiag[k] === 0) continue;
    yAy -= y[k] * ay[k];
    yDy += (y[k] * y[k]) / plan.invDiag[k];
  }
  return yAy / yDy;
}
