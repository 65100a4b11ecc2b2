import { parseStudy } from '../../src/core/study';
import { evaluateNominal, evaluateRuns, planTolerance, type ToleranceSpec } from '../../src/core/tolerance';

/** One chunk of a sweep: runs [from, to) of the study document, and the nominal run when asked. */
export type ToleranceTask = { document: unknown; spec: ToleranceSpec; from: number; to: number; nominal: boolean };
export type ToleranceChunk = { from: number; to: number; deviations: Float64Array; peaks: Float64Array; nominal?: Float64Array };

/**
 * Runs in a pool thread (piscina): parses the document (a chunk is worth far more than a
 * parse), sets the sweep up the same way as the caller and solves its runs. The seeded
 * per-run streams make the answer independent of how the runs are split.
 */
export default function toleranceChunk(task: ToleranceTask): ToleranceChunk {
  const plan = planTolerance(parseStudy(task.document), task.spec);
  const block = evaluateRuns(plan, task.from, task.to);
  const out: ToleranceChunk = { ...block };
  if (task.nominal) out.nominal = evaluateNominal(plan);
  return out;
}
