import { solveDocument, type SolveOptions, type SolveOutcome } from './solve-outcome';
import type { VerdictSummary } from './verdict-summary';

/**
 * One line of solves for one view: `solve` starts a solve and supersedes the one before it
 * (its reply is dropped, and where the platform can stop it, it is stopped). With
 * `verdictFirst`, a worker hands `ahead` the verdict line before `done` gets the outcome.
 * Native and tests solve on the main thread after a timer, so the page paints first.
 */
export type SolverChannel = {
  solve(raw: unknown, options: SolveOptions, done: (outcome: SolveOutcome) => void, ahead?: (summary: VerdictSummary) => void): void;
  /** Drops the solve in flight, if any. */
  cancel(): void;
  close(): void;
};

export function mainThreadChannel(): SolverChannel {
  let timer: ReturnType<typeof setTimeout> | null = null;
  const cancel = () => {
    if (timer !== null) clearTimeout(timer);
    timer = null;
  };
  return {
    solve(raw, options, done) {
      cancel();
      timer = setTimeout(() => {
        timer = null;
        done(solveDocument(raw, options));
      }, 0);
    },
    cancel,
    close: cancel,
  };
}

export function createSolverChannel(): SolverChannel {
  return mainThreadChannel();
}
