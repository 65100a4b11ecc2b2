import type { SolverChannel } from './solver-channel';
import { workerChannel, type WorkerLike } from './worker-channel';

export type { SolverChannel } from './solver-channel';

function startWorker(): WorkerLike | null {
  if (typeof Worker === 'undefined') return null;
  try {
    // Metro bundles the worker's own entry and loads it from the export (asyncRequire.unstable_createWorker).
    return new Worker(new URL('./solver.worker.ts', import.meta.url)) as unknown as WorkerLike;
  } catch {
    return null;
  }
}

/** On the web the study is solved in a Web Worker, off the render path. */
export function createSolverChannel(): SolverChannel {
  return workerChannel(startWorker);
}
