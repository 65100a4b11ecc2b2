import type { SweepWorker } from './sweep-worker';

export type { SweepWorker } from './sweep-worker';

/** On the web the sweep runs in a Web Worker; Metro bundles its entry on its own (asyncRequire.unstable_createWorker). */
export function startSweepWorker(): SweepWorker | null {
  if (typeof Worker === 'undefined') return null;
  try {
    return new Worker(new URL('./tolerance.worker.ts', import.meta.url)) as unknown as SweepWorker;
  } catch {
    return null;
  }
}
