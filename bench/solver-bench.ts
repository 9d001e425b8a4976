/**
 * Solver benchmark (npm run bench): the full solve of a realistic port section at 64k to 4M cells against
 * red-black SOR over the fluid cells with its optimum factor (bench/sor.ts) on the same system. Each size runs in two fresh processes: one for timings (repeated solves in a warm
 * process, as in the app), one for the peak memory of a single solve. Times are medians of wall-clock time
 * (other work on the machine shows up in them; CPU time is printed beside them). "runtime MB" is the resident
 * set before the solve (Node, the TypeScript loader, compiled code), included in "peak MB".
 * Then one line compares the solve with and without a passage depth at 1M cells (bench/depth-compare.ts).
 * Environment: BENCH_SIZES=65536,262144 to pick sizes; BENCH_SOR=0 to skip the SOR baseline; BENCH_DEPTH=0 to skip
 * the depth line.
 */
import { spawnSync } from 'node:child_process';
import { loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';
import { SAMPLE } from './bench-problem.ts';
import { runSize, type MemoryReport, type SizeArgs, type SizeReport, type TimeReport } from './bench-size.ts';
import { SOR_FACTOR_METHOD } from './sor.ts';
import { compareDepth, describeDepth, type DepthReport } from './depth-compare.ts';

const SIZES = [65_536, 262_144, 1_048_576, 4_194_304];
/** Runs per size: more where a run is short, so that a burst of other work on the machine moves the median less. */
const RUNS = (cells: number) => (cells > 2_000_000 ? 3 : cells > 300_000 ? 5 : 11);

/** Cells and runs of the depth line. */
const DEPTH_CELLS = 1_048_576;
const DEPTH_RUNS = 5;

if (process.argv[2] === '--child') {
  const args = JSON.parse(process.argv[3]) as SizeArgs;
  console.log(JSON.stringify(runSize(args)));
} else if (process.argv[2] === '--depth-child') {
  console.log(JSON.stringify(compareDepth(DEPTH_CELLS, DEPTH_RUNS)));
} else {
  main();
}

function main(): void {
  const sizes = process.env.BENCH_SIZES ? process.env.BENCH_SIZES.split(',').map(Number) : SIZES;
  const withSor = process.env.BENCH_SOR !== '0';
  console.log(`Portwright solver benchmark: ${SAMPLE}, tolerance 1e-8, load average ${loadavg().map((l) => l.toFixed(1)).join(' ')}`);
  if (withSor) console.log(`Baseline: red-black SOR over fluid cells from 0, same operator and stopping rule; ${SOR_FACTOR_METHOD}`);
  const reports: SizeReport[] = [];
  for (const cells of sizes) {
    const timing = inChild({ cells, runs: RUNS(cells), mode: 'time', sor: withSor }) as TimeReport;
    const memory = inChild({ cells, runs: 1, mode: 'memory', sor: false }) as MemoryReport;
    const report: SizeReport = { ...timing, ...memory };
    reports.push(report);
    console.log(describe(report));
  }
  console.log(`\n${table(reports)}`);
  if (process.env.BENCH_DEPTH !== '0') console.log(describeDepth(inChild(null) as DepthReport));
  console.log(`load average at the end ${loadavg().map((l) => l.toFixed(1)).join(' ')}`);
}

/** Runs one size (or, for null, the depth comparison) in a fresh process and returns its report. */
function inChild(args: SizeArgs | null): TimeReport | MemoryReport | DepthReport {
  const script = fileURLToPath(import.meta.url);
  const argv = args === null ? ['--depth-child'] : ['--child', JSON.stringify(args)];
  const out = spawnSync(process.execPath, [...process.execArgv, script, ...argv], { encoding: 'utf8', maxBuffer: 1 << 24 });
  if (out.status !== 0) throw new Error(`benchmark child for ${args === null ? 'the depth line' : `${args.cells} cells`} failed:\n${out.stderr}`);
  const lines = out.stdout.trim().split('\n');
  return JSON.parse(lines[lines.length - 1]) as TimeReport | MemoryReport | DepthReport;
}

function describe(r: SizeReport): string {
  const p = r.phases;
  const sor = r.sor
    ? `SOR (rhoJ ${r.sor.rhoJ.toFixed(7)} from ${r.sor.factorIterations} inverse iterations, omega ${r.sor.omega.toFixed(5)}, ${r.sor.sweeps} sweep pairs) ` +
      (r.sor.converged ? fmtMs(r.sor.ms) : `capped at ${fmtMs(r.sor.ms)} with relative residual ${r.sor.residual.toExponential(1)}`)
    : 'SOR skipped';
  const total = Object.values(p).reduce((a, b) => a + b, 0);
  return `${r.nx} x ${r.ny}: phases (medians, ms) rasterise ${p.rasterise.toFixed(1)}, connect ${p.connect.toFixed(1)}, ` +
    `assemble ${p.assemble.toFixed(1)}, multigrid set-up ${p.setup.toFixed(1)}, PCG ${p.pcg.toFixed(1)}, ` +
    `velocity and checks ${p.fields.toFixed(1)}, wall speeds ${p.walls.toFixed(1)}; sum ${total.toFixed(0)}; ${sor}`;
}

function table(reports: readonly SizeReport[]): string {
  const head = ['cells', 'grid', 'iter', 'median ms', 'cpu ms', 'ns/cell', 'MG-PCG ms', 'MG-PCG ns/cell', 'peak MB', 'runtime MB', 'result MB', 'SOR ms', 'SOR residual', 'SOR / MG-PCG'];
  const rows = reports.map((r) => [
    r.cells.toLocaleString('en-US'), `${r.nx}x${r.ny}`, String(r.iterations), r.medianMs.toFixed(0), r.medianCpuMs.toFixed(0),
    ((r.medianMs * 1e6) / (r.nx * r.ny)).toFixed(0), r.linearMs.toFixed(0), ((r.linearMs * 1e6) / (r.nx * r.ny)).toFixed(0),
    r.peakRssMb.toFixed(0), r.baselineRssMb.toFixed(0), r.arrayBuffersMb.toFixed(0),
    r.sor ? `${r.sor.converged ? '' : '>'}${r.sor.ms.toFixed(0)}` : '-', r.sor ? r.sor.residual.toExponential(1) : '-',
    r.sor ? `${r.sor.converged ? '' : '>'}${(r.sor.ms / r.linearMs).toFixed(0)}x` : '-',
  ]);
  const widths = head.map((h, c) => Math.max(h.length, ...rows.map((row) => row[c].length)));
  const line = (cells: readonly string[]) => cells.map((cell, c) => cell.padStart(widths[c])).join('  ');
  return [line(head), ...rows.map(line)].join('\n');
}

function fmtMs(ms: number): string {
  return ms >= 10_000 ? `${(ms / 1000).toFixed(1)} s` : `${ms.toFixed(0)} ms`;
}
