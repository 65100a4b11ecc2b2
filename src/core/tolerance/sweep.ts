import type { StudyDocument } from '../study';
import { evaluateNominal, evaluateRuns, planTolerance } from './plan';
import { summariseTolerance } from './summarise';
import type { ToleranceResult, ToleranceSpec } from './types';

/** Runs per progress report. */
const PROGRESS_EVERY = 25;

/**
 * A whole sweep in this thread: set up, the nominal run, every run, the statistics.
 * `onProgress(done, total)` is told every few runs. Callers with many runs split
 * `evaluateRuns` over workers instead (server/workers, src/features/tolerance).
 */
export function runTolerance(doc: StudyDocument, spec: ToleranceSpec, onProgress?: (done: number, total: number) => void): ToleranceResult {
  const plan = planTolerance(doc, spec);
  const nominal = evaluateNominal(plan);
  const block = evaluateRuns(plan, 0, plan.runs, onProgress ? (done) => done % PROGRESS_EVERY === 0 && onProgress(done, plan.runs) : undefined);
  onProgress?.(plan.runs, plan.runs);
  return summariseTolerance(plan, nominal, block);
}
