import type { SolveReply, SolveRequest } from './solve-outcome';
import { mainThreadChannel, type SolverChannel } from './solver-channel';

/** What the channel needs of a Web Worker (a test gives a fake one). */
export type WorkerLike = {
  postMessage(request: SolveRequest): void;
  terminate(): void;
  onmessage: ((event: { data: SolveReply }) => void) | null;
  onerror: ((event: { preventDefault?: () => void }) => void) | null;
};

const now = () => globalThis.performance?.now() ?? Date.now();

/** A User Timing entry per landed solve (`junctura:solve`: request to reply, the worker's own time as detail), for profiling in the browser. */
function mark(sentAt: number, solveMs: number | undefined): void {
  try {
    globalThis.performance?.measure?.('junctura:solve', { start: sentAt, end: now(), detail: { solveMs } });
  } catch {
    // User Timing Level 3 missing: nothing to record.
  }
}

/**
 * Solves in a worker, off the render path. A solve cannot be interrupted inside the worker,
 * so one superseded while it runs ends that worker and a fresh one takes the newer document
 * (starting one costs less than finishing a stale long profile). Replies to any but the
 * latest request are dropped. Without workers (or when one fails), the main thread.
 */
export function workerChannel(start: () => WorkerLike | null): SolverChannel {
  let worker: WorkerLike | null = null;
  let busy = false;
  let latest = 0;
  let fallback: SolverChannel | null = null;

  const stop = () => {
    worker?.terminate();
    worker = null;
    busy = false;
  };
  const toMainThread = (): SolverChannel => {
    stop();
    fallback ??= mainThreadChannel();
    return fallback;
  };

  return {
    solve(raw, options, done) {
      const id = ++latest;
      if (fallback) return fallback.solve(raw, options, done);
      if (busy) stop();
      worker ??= start();
      if (!worker) return toMainThread().solve(raw, options, done);
      const sentAt = now();
      worker.onmessage = (event) => {
        if (event.data.id !== latest) return;
        busy = false;
        mark(sentAt, event.data.solveMs);
        done(event.data.outcome);
      };
      worker.onerror = (event) => {
        event.preventDefault?.();
        // The worker could not load or crashed: this solve and the later ones run on the main thread.
        if (id === latest) toMainThread().solve(raw, options, done);
      };
      busy = true;
      worker.postMessage({ id, raw, options });
    },
    cancel() {
      latest++;
      if (busy) stop();
      fallback?.cancel();
    },
    close() {
      latest++;
      stop();
      fallback?.close();
    },
  };
}
