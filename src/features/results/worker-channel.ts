import { requestParts, type SolveOptions, type SolveReply, type SolveRequest } from './solve-outcome';
import { mainThreadChannel, type SolverChannel } from './solver-channel';

/** What the channel needs of a Web Worker (a test gives a fake one). */
export type WorkerLike = {
  postMessage(request: SolveRequest): void;
  terminate(): void;
  onmessage: ((event: { data: SolveReply }) => void) | null;
  onerror: ((event: { preventDefault?: () => void }) => void) | null;
};

/**
 * What ending a busy worker costs beyond waiting for it, ms: a fresh worker loads the solver
 * and runs its first solve without compiled code. Measured in headless Chromium on the
 * 10,000-segment live-edit study (`npm run bench`'s case, a shared 2-core machine): 55–140 ms to
 * start and 45–115 ms more for the first solve than for the next ones (a spare started ahead
 * saves the start only). A solve expected to end sooner than this is left to finish.
 */
export const RESTART_COST_MS = 150;

/** How long after a solve lands a spare worker is started, ms: after the reply's render, before the next edit is likely. */
const SPARE_DELAY_MS = 250;

const now = () => globalThis.performance?.now() ?? Date.now();

/**
 * A User Timing entry per landed solve (`junctura:solve`: request to reply, the worker's own
 * time as detail) and per verdict line sent ahead of it (`junctura:verdict`), for profiling in the browser.
 */
function mark(sentAt: number, solveMs: number | undefined, name = 'junctura:solve'): void {
  try {
    globalThis.performance?.measure?.(name, { start: sentAt, end: now(), detail: { solveMs } });
  } catch {
    // User Timing Level 3 missing: nothing to record.
  }
}

type Done = Parameters<SolverChannel['solve']>[2];
type Ahead = Parameters<SolverChannel['solve']>[3];
type Request = { id: number; raw: unknown; options: SolveOptions; done: Done; ahead: Ahead };

/**
 * Solves in a worker, off the render path. A solve cannot be interrupted inside the worker:
 * a newer request waits for the one in flight when that is expected to end within
 * RESTART_COST_MS (by the worker's last solve time), and otherwise ends that worker and goes
 * to a fresh one (a spare started while idle, once the channel has had to end one). Only the
 * latest request is answered (a newer one replaces a waiting one); replies to any other are
 * dropped. Without workers (or when one fails), the main thread.
 */
export function workerChannel(start: () => WorkerLike | null): SolverChannel {
  let worker: WorkerLike | null = null;
  let spare: WorkerLike | null = null;
  let spareTimer: ReturnType<typeof setTimeout> | null = null;
  let restarted = false;
  /** The request the worker is solving and when it was sent; the newer one waiting for it. */
  let inFlight: { id: number; sentAt: number } | null = null;
  let waiting: Request | null = null;
  /** The worker's last solve time, ms (null until one lands). */
  let lastSolveMs: number | null = null;
  let latest = 0;
  let fallback: SolverChannel | null = null;
  /** The document last posted, and to which worker: the parts a newer one shares with it are not copied again. */
  let posted: { to: WorkerLike; raw: unknown } | null = null;

  const stop = () => {
    worker?.terminate();
    worker = null;
    inFlight = null;
    waiting = null;
  };
  const dropSpare = () => {
    if (spareTimer !== null) clearTimeout(spareTimer);
    spareTimer = null;
    spare?.terminate();
    spare = null;
  };
  const toMainThread = (): SolverChannel => {
    stop();
    dropSpare();
    fallback ??= mainThreadChannel();
    return fallback;
  };
  /** Once the channel has had to end a busy worker, a spare is started while the page is idle, ready for the next time. */
  const warmSpare = () => {
    if (!restarted || spare || spareTimer !== null || fallback) return;
    spareTimer = setTimeout(() => {
      spareTimer = null;
      if (!spare && !fallback) spare = start();
    }, SPARE_DELAY_MS);
  };
  /** Whether the solve in flight is expected to end within RESTART_COST_MS (never before the worker's first solve time is known). */
  const nearlyDone = (flight: { sentAt: number }) => lastSolveMs !== null && lastSolveMs - (now() - flight.sentAt) < RESTART_COST_MS;
  const restart = () => {
    stop();
    restarted = true;
  };

  const send = (request: Request) => {
    if (!worker) {
      worker = spare ?? start();
      spare = null;
    }
    const current = worker;
    if (!current) {
      toMainThread().solve(request.raw, request.options, request.done, request.ahead);
      return;
    }
    const { id, done, ahead } = request;
    const sentAt = now();
    current.onmessage = (event) => {
      if (worker !== current) return;
      const reply = event.data;
      if ('ahead' in reply) {
        if (reply.id === latest) {
          mark(sentAt, reply.solveMs, 'junctura:verdict');
          ahead?.(reply.ahead);
        }
        return;
      }
      if (reply.solveMs !== undefined) lastSolveMs = reply.solveMs;
      inFlight = null;
      if (reply.id === latest) {
        mark(sentAt, reply.solveMs);
        done(reply.outcome);
      }
      const next = waiting;
      waiting = null;
      if (next && next.id === latest) send(next);
      else warmSpare();
    };
    current.onerror = (event) => {
      event.preventDefault?.();
      if (worker !== current) return;
      // The worker could not load or crashed: the latest request and the later ones run on the main thread.
      const pending = waiting ?? (id === latest ? request : null);
      const channel = toMainThread();
      if (pending) channel.solve(pending.raw, pending.options, pending.done, pending.ahead);
    };
    inFlight = { id, sentAt };
    const parts = requestParts(request.raw, posted?.to === current ? posted.raw : null);
    posted = { to: current, raw: request.raw };
    current.postMessage({ id, ...parts, options: request.options });
  };

  return {
    solve(raw, options, done, ahead) {
      const id = ++latest;
      if (fallback) return fallback.solve(raw, options, done, ahead);
      const request: Request = { id, raw, options, done, ahead };
      if (inFlight) {
        if (nearlyDone(inFlight)) {
          // The newer request follows on the same, warm worker; its reply to the older one is dropped.
          waiting = request;
          return;
        }
        restart();
      }
      send(request);
    },
    cancel() {
      latest++;
      waiting = null;
      if (inFlight && !nearlyDone(inFlight)) restart();
      fallback?.cancel();
    },
    close() {
      latest++;
      stop();
      dropSpare();
      fallback?.close();
    },
  };
}
