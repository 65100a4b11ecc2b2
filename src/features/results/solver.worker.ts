import { createEvaluationCache, createParseCache } from '@/core/study';

import { parseForSolve, receivedDocument, solveParsed, type SolveReply, type SolveRequest } from './solve-outcome';
import { createPrimer } from './solver-priming';

/**
 * The study solver off the page's main thread (web): each request is parsed and solved with
 * the core's pipeline and answered with its id; with `verdictFirst` the verdict line goes
 * ahead of the full result. Requests leave out the parts kept from the one before (`kept`).
 * Replies are plain data (structured clone). A fresh worker primes itself on a long study
 * while idle (solver-priming), so the next edits meet compiled code.
 */
const scope = self as unknown as { onmessage: ((event: MessageEvent<SolveRequest>) => void) | null; postMessage: (reply: SolveReply) => void };

/** The document of the last request, whose parts the next one may keep. */
let before: unknown = null;
/** Parsed profiles by this worker's copy of the raw profile (a kept profile is the same object). */
const parsed = createParseCache();
/** Work kept across this worker's solves (the rail plan's tap selection of a profile). */
const evaluations = createEvaluationCache();
const primer = createPrimer<SolveRequest['options']>({
  schedule: (task) => setTimeout(task, 0),
  cancel: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
  now: () => performance.now(),
  // As the request was solved, the verdict line ahead included; nothing is posted.
  solve: (document, options) => void solveParsed(document, options, options.verdictFirst ? () => undefined : undefined, evaluations),
});

scope.onmessage = (event) => {
  primer.interrupt();
  const { id, options } = event.data;
  const raw = receivedDocument(event.data, before);
  before = raw;
  const start = performance.now();
  const read = parseForSolve(raw, parsed);
  if (!('document' in read)) {
    scope.postMessage({ id, outcome: read, solveMs: performance.now() - start });
    return;
  }
  const outcome = solveParsed(read.document, options, options.verdictFirst ? (ahead) => scope.postMessage({ id, ahead, solveMs: performance.now() - start }) : undefined, evaluations);
  const solveMs = performance.now() - start;
  scope.postMessage({ id, outcome, solveMs });
  if (outcome.kind === 'ok' || outcome.kind === 'verdict') primer.solved(read.document, options, solveMs);
};
