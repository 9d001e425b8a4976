/** The worker API in Node over a MessageChannel: replies, transfers, newest-request-wins, typed failures. */
import { readFileSync } from 'node:fs';
import { afterEach, describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import { defaultTolerance, sectionToDomain } from '../../src/geometry/index.ts';
import type { FlowDomain } from '../../src/solver/types.ts';
import { SolverPool } from '../../src/workers/pool.ts';
import { SolverClient } from '../../src/workers/solver-client.ts';
import type { WorkerHandle } from '../../src/workers/worker-handle.ts';
import { portWorker, threadWorker } from './worker-handles.ts';

function sampleDomain(): FlowDomain {
  const doc = loadDocument(readFileSync('samples/street-tight-short-side.json', 'utf8'));
  const section = doc.variants[0].section;
  return sectionToDomain(section, defaultTolerance(section));
}

/** A client whose worker is the API exposed on the other end of a MessageChannel. */
function channelClient(): { client: SolverClient; close: () => void } {
  const client = new SolverClient(() => portWorker());
  return { client, close: () => client.dispose() };
}

const open: Array<() => void> = [];
afterEach(() => open.splice(0).forEach((close) => close()));

describe('solver worker API over a MessageChannel', () => {
  it('solves a sample and sends the field back as a transferred Float32Array', async () => {
    const { client, close } = channelClient();
    open.push(close);
    const domain = sampleDomain();
    const reply = await client.solveLatest({ domain, targetCells: 20_000, reading: {} });
    expect(reply?.ok).toBe(true);
    if (!reply?.ok) return;
    expect(reply.speedRatio).toBeInstanceOf(Float32Array);
    expect(reply.speedRatio.length).toBe(reply.nx * reply.ny);
    expect(reply.residual).toBeLessThan(1e-7);
    expect(reply.peak.speedRatio).toBeGreaterThan(1);
    expect(reply.walls.map((w) => w.name)).toContain('short side');
    expect(reply.reading?.stations.length).toBeGreaterThan(10);
    // the caller's domain was copied, not detached, by the transfer
    expect(domain.outer.xy.length).toBeGreaterThan(0);
  });

  it('carries the passage depth to the worker and leaves the caller\'s depth lattice usable', async () => {
    const { client, close } = channelClient();
    open.push(close);
    const plane = sampleDomain();
    const values = new Float64Array(4).fill(32);
    const domain: FlowDomain = { ...plane, depth: { kind: 'sampled', x0: 0, y0: 0, dx: 1, dy: 1, nx: 2, ny: 2, values } };
    const flat = await client.solveLatest({ domain: plane, targetCells: 20_000, reading: null });
    const deep = await client.solveLatest({ domain, targetCells: 20_000, reading: null });
    expect(flat?.ok && deep?.ok).toBe(true);
    if (!flat?.ok || !deep?.ok) return;
    // A constant depth of 32 multiplies the conductance by 32 [derived].
    expect(deep.conductance / flat.conductance).toBeCloseTo(32, 6);
    expect(values.length).toBe(4);
    expect(values[3]).toBe(32);
  });

  it('carries the walls thinner than a cell: none on the sample, the divider on a divided channel', async () => {
    const { client, close } = channelClient();
    open.push(close);
    const sample = await client.solveLatest({ domain: sampleDomain(), targetCells: 5_000 });
    expect(sample?.ok && sample.thinWalls).toEqual([]);
    // A 4 x 2 channel turning round a 0.01 thick divider (y 0.95..0.96, x 0..3): inlet below it, outlet above.
    const pts = [0, 0, 4, 0, 4, 2, 0, 2, 0, 0.96, 3, 0.96, 3, 0.95, 0, 0.95];
    const marks = [0, 0, 0, 2, 0, 0, 0, 1];
    const domain: FlowDomain = {
      outer: { xy: Float64Array.from(pts), marks: Uint8Array.from(marks), wallIds: Int32Array.from([-1, -1, -1, -1, 0, 0, 0, -1]) },
      islands: [],
      wallNames: ['divider'],
    };
    const divided = await client.solveLatest({ domain, targetCells: 2_000 });
    expect(divided?.ok && divided.thinWalls.map((w) => w.wallName)).toEqual(['divider']);
  });

  it('skips wall speeds only when asked and no reading needs them (the drag preview)', async () => {
    const { client, close } = channelClient();
    open.push(close);
    const domain = sampleDomain();
    const preview = await client.solveLatest({ domain, targetCells: 5_000, wallSpeeds: false });
    const read = await client.solveLatest({ domain, targetCells: 5_000, wallSpeeds: false, reading: {} });
    expect(preview?.ok && preview.walls).toEqual([]);
    expect(read?.ok && read.walls.map((w) => w.name)).toContain('short side');
    expect(read?.ok && read.reading?.walls.length).toBeGreaterThan(0);
  });

  it('drops an older request when a newer one arrives before its result', async () => {
    const { client, close } = channelClient();
    open.push(close);
    const domain = sampleDomain();
    const first = client.solveLatest({ domain, targetCells: 40_000 });
    const second = client.solveLatest({ domain, targetCells: 20_000 });
    const third = client.solveLatest({ domain, targetCells: 10_000 });
    const [a, b, c] = await Promise.all([first, second, third]);
    expect(a).toBeNull();
    expect(b).toBeNull();
    expect(c?.ok).toBe(true);
    if (c?.ok) expect(c.nx * c.ny).toBeLessThan(15_000);
  });

  it('stops a solve in flight at its next iteration when superseded (shared cancel flag)', async () => {
    // A real second thread: in one thread the first solve would finish before the second request is even sent.
    const client = new SolverClient(() => threadWorker());
    open.push(() => client.dispose());
    expect(client.canInterrupt).toBe(true);
    const domain = sampleDomain();
    // A tolerance no solve reaches keeps the first request iterating until it is superseded.
    await client.ready;
    const started = performance.now();
    const slow = client.solveLatest({ domain, targetCells: 1_000_000, tolerance: 1e-30 });
    await new Promise((r) => setTimeout(r, 300));
    const fast = await client.solveLatest({ domain, targetCells: 5_000 });
    expect(await slow).toBeNull();
    expect(fast?.ok).toBe(true);
    console.log(`superseded 1M-cell solve gave way after ${(performance.now() - started).toFixed(0)} ms in all`);
  });

  it('lets a preview in flight finish and shows it when newer previews arrive; the newest waiting one runs next', async () => {
    const { client, close } = channelClient();
    open.push(close);
    const domain = sampleDomain();
    const preview = { preview: true } as const;
    const first = client.solveLatest({ domain, targetCells: 12_000 }, preview);
    const second = client.solveLatest({ domain, targetCells: 8_000 }, preview);
    const third = client.solveLatest({ domain, targetCells: 4_000 }, preview);
    const [a, b, c] = await Promise.all([first, second, third]);
    expect(a?.ok && a.nx * a.ny).toBeGreaterThan(10_000);
    // The second never ran: the third replaced it while it waited.
    expect(b).toBeNull();
    expect(c?.ok && c.nx * c.ny).toBeLessThan(6_000);
  });

  it('stops a preview in flight when a request that is not a preview arrives', async () => {
    const { client, close } = channelClient();
    open.push(close);
    const domain = sampleDomain();
    const dragged = client.solveLatest({ domain, targetCells: 12_000 }, { preview: true });
    const released = client.solveLatest({ domain, targetCells: 4_000 });
    expect(await dragged).toBeNull();
    expect((await released)?.ok).toBe(true);
  });

  it('keeps a preview running in a real worker thread while a newer preview waits (no stop flag raised)', async () => {
    const client = new SolverClient(() => threadWorker());
    open.push(() => client.dispose());
    const domain = sampleDomain();
    await client.ready;
    const long = client.solveLatest({ domain, targetCells: 300_000 }, { preview: true });
    await new Promise((r) => setTimeout(r, 50));
    const next = client.solveLatest({ domain, targetCells: 5_000 }, { preview: true });
    const [a, b] = await Promise.all([long, next]);
    expect(a?.ok && a.nx * a.ny).toBeGreaterThan(250_000);
    expect(b?.ok && b.nx * b.ny).toBeLessThan(8_000);
  });

  it('returns a blocked passage as a typed failure with a plain message', async () => {
    const { client, close } = channelClient();
    open.push(close);
    const domain = sampleDomain();
    const walled: FlowDomain = { ...domain, outer: { ...domain.outer, marks: new Uint8Array(domain.outer.marks.length) } };
    const reply = await client.solveLatest({ domain: walled, targetCells: 5_000 });
    expect(reply?.ok).toBe(false);
    if (reply && !reply.ok) {
      expect(reply.code).toBe('no-inlet');
      expect(reply.message).toMatch(/inlet/i);
    }
  });

  it('sweeps jobs across a pool and keeps their order', async () => {
    const channels: WorkerHandle[] = [];
    const pool = new SolverPool(() => {
      const worker = portWorker();
      channels.push(worker);
      return worker;
    }, 3);
    open.push(() => pool.dispose());
    const domain = sampleDomain();
    const sizes = [4_000, 8_000, 12_000, 16_000];
    const progress: number[] = [];
    // Only the live worker starts with the pool; the first sweep starts the other two.
    expect(channels.length).toBe(1);
    const replies = await pool.sweep(sizes.map((targetCells) => ({ domain, targetCells })), (done) => progress.push(done));
    expect(progress).toEqual([1, 2, 3, 4]);
    expect(channels.length).toBe(3);
    const cells = replies.map((r) => (r.ok ? r.nx * r.ny : 0));
    for (let k = 1; k < cells.length; k++) expect(cells[k]).toBeGreaterThan(cells[k - 1]);
  });
});
