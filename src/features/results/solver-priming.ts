import type { StudyDocument } from '@/core/study';

/**
 * Priming a fresh solver worker. The browser compiles the solver's hot code to its optimised
 * tiers only after it has run a while: in headless Chromium (a shared 2-core machine), the
 * 10,000-segment live-edit study's verdict took 80–115 ms on the second to sixth solve of a
 * fresh worker and 35–45 ms from about the tenth. So after its first solves of a long study, a
 * worker spends idle time solving a cut copy of that study (its first PRIME_SEGMENTS segments,
 * run once, with the same options) in short tasks of their own, until it has solved PRIME_RUNS of them:
 * the user's next edits then meet compiled code. Priming runs once per worker, in one burst
 * bounded by PRIME_RUNS and PRIME_BUDGET_MS, and its results are thrown away. A request that
 * comes in ends it for good: at worst the request waits for the one short task running, and a
 * worker never primes again later, when another worker (the page's other solver) may be busy
 * with the user's next edit.
 */

/** Segments of the cut copy: about a tenth of the live-edit study, a 5–20 ms solve. */
export const PRIME_SEGMENTS = 1000;
/**
 * Priming solves per worker at most. With 40 cut solves ahead, the next ten full verdict
 * solves of the live-edit study in headless Chromium had medians of 37–50 ms, against 48–65 ms
 * with 20 (three runs each, load ≈1.5–1.9).
 */
export const PRIME_RUNS = 40;
/** Time a worker spends priming at most, ms. */
export const PRIME_BUDGET_MS = 600;
/** A study solved faster than this (ms) is not worth priming for. */
export const PRIME_MIN_SOLVE_MS = 25;
/** A priming solve that takes longer than this (ms) ends priming: it would hold up the next request. */
export const PRIME_TASK_MAX_MS = 40;

/**
 * The cut copy primed on: the same study over its first `segments` segments, run once (not
 * repeated, no periodic search), so each priming solve stays short.
 */
export function primingDocument(document: StudyDocument, segments = PRIME_SEGMENTS): StudyDocument {
  return { ...document, profile: { segments: document.profile.segments.slice(0, segments), repeat: 1, periodic: false } };
}

export type PrimerHost<O> = {
  /** Runs `task` soon, as a task of its own (after any message already queued). */
  schedule(task: () => void): unknown;
  cancel(handle: unknown): void;
  now(): number;
  /** Solves `document` as a request with `options` would; the result is not used. */
  solve(document: StudyDocument, options: O): void;
};

export type Primer<O> = {
  /** After a request's solve: primes on its document when this worker has not primed yet and the study is long. */
  solved(document: StudyDocument, options: O, solveMs: number): void;
  /** A request came in: priming, if running, ends for good. */
  interrupt(): void;
  /** Priming solves run so far and the time they took, ms. */
  readonly runs: number;
  readonly spentMs: number;
};

export function createPrimer<O>(host: PrimerHost<O>): Primer<O> {
  let runs = 0;
  let spentMs = 0;
  let handle: unknown = null;
  /** Priming runs once per worker: not yet, in progress, or over (used up, or ended by a request). */
  let phase: 'idle' | 'priming' | 'over' = 'idle';

  const step = (document: StudyDocument, options: O) => {
    handle = null;
    const start = host.now();
    try {
      host.solve(document, options);
    } catch {
      phase = 'over';
      return;
    }
    const ms = host.now() - start;
    runs++;
    spentMs += ms;
    if (ms > PRIME_TASK_MAX_MS || runs >= PRIME_RUNS || spentMs >= PRIME_BUDGET_MS) {
      phase = 'over';
      return;
    }
    handle = host.schedule(() => step(document, options));
  };

  return {
    solved(document, options, solveMs) {
      if (phase !== 'idle' || solveMs < PRIME_MIN_SOLVE_MS || document.profile.segments.length <= PRIME_SEGMENTS) return;
      phase = 'priming';
      const cut = primingDocument(document);
      handle = host.schedule(() => step(cut, options));
    },
    interrupt() {
      if (phase !== 'priming') return;
      if (handle !== null) host.cancel(handle);
      handle = null;
      phase = 'over';
    },
    get runs() {
      return runs;
    },
    get spentMs() {
      return spentMs;
    },
  };
}
