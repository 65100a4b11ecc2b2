import os from 'node:os';
import path from 'node:path';
import { Piscina } from 'piscina';
import type { ToleranceChunk, ToleranceTask } from './tolerance-worker';

/** Chunks per thread: enough to even out slow and fast runs, few enough that each is worth its parse. */
const CHUNKS_PER_THREAD = 4;

let shared: Piscina<ToleranceTask, ToleranceChunk> | null = null;

/** Threads: one per core, at least one, at most TOLERANCE_THREADS when it is set. */
export function poolThreads(env: NodeJS.ProcessEnv = process.env): number {
  const cores = typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length;
  const cap = Number(env.TOLERANCE_THREADS);
  return Math.max(1, Number.isInteger(cap) && cap > 0 ? Math.min(cap, cores) : cores);
}

export function createTolerancePool(threads = poolThreads()): Piscina<ToleranceTask, ToleranceChunk> {
  return new Piscina<ToleranceTask, ToleranceChunk>({
    filename: path.join(__dirname, 'tolerance-worker.cjs'),
    minThreads: 0,
    maxThreads: threads,
    // Idle threads leave after a while, so a server that swept once does not hold their memory.
    idleTimeout: 30_000,
  });
}

/** The process's pool, made on first use. */
export function tolerancePool(): Piscina<ToleranceTask, ToleranceChunk> {
  shared ??= createTolerancePool();
  return shared;
}

export async function closeTolerancePool(): Promise<void> {
  const pool = shared;
  shared = null;
  await pool?.destroy();
}

/** Runs [0, runs) split in chunks over the pool; the first chunk also solves the nominal run. */
export async function sweepInPool(
  pool: Piscina<ToleranceTask, ToleranceChunk>,
  task: Omit<ToleranceTask, 'from' | 'to' | 'nominal'>,
  runs: number,
): Promise<{ nominal: Float64Array; deviations: Float64Array; peaks: Float64Array }> {
  const chunks = Math.min(runs, pool.options.maxThreads * CHUNKS_PER_THREAD);
  const size = Math.ceil(runs / chunks);
  const jobs: Promise<ToleranceChunk>[] = [];
  for (let from = 0; from < runs; from += size) {
    jobs.push(pool.run({ ...task, from, to: Math.min(runs, from + size), nominal: from === 0 }));
  }
  const parts = await Promise.all(jobs);
  const join = (pick: (c: ToleranceChunk) => Float64Array) => {
    const out = new Float64Array(parts.reduce((n, c) => n + pick(c).length, 0));
    let at = 0;
    for (const c of parts) {
      out.set(pick(c), at);
      at += pick(c).length;
    }
    return out;
  };
  return { nominal: parts[0].nominal!, deviations: join((c) => c.deviations), peaks: join((c) => c.peaks) };
}
