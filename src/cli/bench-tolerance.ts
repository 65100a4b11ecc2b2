import fs from 'node:fs';
import path from 'node:path';

import { parseStudy } from '../core/study';
import { evaluateRuns, planTolerance, type ToleranceSpec } from '../core/tolerance';
import { createTolerancePool, poolThreads, sweepInPool } from '../../server/workers/tolerance-pool';

/** Runs and profile length of the timed Monte Carlo sweep. */
export const TOLERANCE_RUNS = 10_000;
export const TOLERANCE_SEGMENTS = 1000;
/** Runs timed in this thread alone (the single-thread figure is runs per second). */
const SINGLE_THREAD_RUNS = 200;

/**
 * The bench electronic-load demo study (two MOSFETs in parallel on one sink, with SOA) with
 * its profile replaced by TOLERANCE_SEGMENTS invented electrical steps (demo data), swept over
 * every input the study has.
 */
export function toleranceDocument(segments = TOLERANCE_SEGMENTS): Record<string, unknown> {
  const file = path.resolve(__dirname, '..', '..', 'examples', 'bench-electronic-load.json');
  const doc = JSON.parse(fs.readFileSync(file, 'utf8')) as Record<string, unknown>;
  const list = Array.from({ length: segments }, (_, i) => ({
    durationS: 0.2 + (i % 11) * 0.4,
    vinV: 30,
    voutV: 2 + ((i * 7) % 25),
    iloadA: Number((0.5 + ((i * 13) % 31) / 5).toFixed(1)),
  }));
  return { ...doc, title: `Bench load, ${segments.toLocaleString('en')}-step log (demo data)`, profile: { segments: list } };
}

export const TOLERANCE_SPEC: ToleranceSpec = {
  mode: 'monte-carlo',
  rthJcPct: 10,
  rthSaPct: 15,
  interfacePct: 20,
  ambientLowK: -5,
  ambientHighK: 10,
  linePct: 5,
  loadPct: 5,
  sharePct: 10,
  runs: TOLERANCE_RUNS,
  seed: 2024,
};

export type ToleranceBench = {
  runs: number;
  segments: number;
  threads: number;
  poolWallSeconds: number;
  poolRunsPerSecond: number;
  singleThreadRuns: number;
  singleThreadRunsPerSecond: number;
  singleThreadEstimatedSecondsForAll: number;
  speedup: number;
};

const now = () => Number(process.hrtime.bigint()) / 1e9;

/** Wall time of the whole sweep on the piscina pool (threads started inside the timing), and this thread alone. */
export async function benchTolerance(): Promise<ToleranceBench> {
  const document = toleranceDocument();
  const plan = planTolerance(parseStudy(document), TOLERANCE_SPEC);
  evaluateRuns(plan, 0, 20); // warm-up
  const t0 = now();
  evaluateRuns(plan, 0, SINGLE_THREAD_RUNS);
  const single = SINGLE_THREAD_RUNS / (now() - t0);

  const threads = poolThreads();
  const pool = createTolerancePool(threads);
  const t1 = now();
  const out = await sweepInPool(pool, { document, spec: TOLERANCE_SPEC }, TOLERANCE_RUNS);
  const wall = now() - t1;
  await pool.destroy();
  if (out.peaks.length !== TOLERANCE_RUNS * 2) throw new Error('tolerance bench: the pool lost runs');
  return {
    runs: TOLERANCE_RUNS,
    segments: TOLERANCE_SEGMENTS,
    threads,
    poolWallSeconds: wall,
    poolRunsPerSecond: TOLERANCE_RUNS / wall,
    singleThreadRuns: SINGLE_THREAD_RUNS,
    singleThreadRunsPerSecond: single,
    singleThreadEstimatedSecondsForAll: TOLERANCE_RUNS / single,
    speedup: TOLERANCE_RUNS / wall / single,
  };
}
