import { solveDocument, type SolveReply, type SolveRequest } from './solve-outcome';

/**
 * The study solver off the page's main thread (web): each request is parsed and solved with
 * the core's pipeline and answered with its id; with `verdictFirst` the verdict line goes
 * ahead of the full result. Replies are plain data (structured clone).
 */
const scope = self as unknown as { onmessage: ((event: MessageEvent<SolveRequest>) => void) | null; postMessage: (reply: SolveReply) => void };

scope.onmessage = (event) => {
  const { id, raw, options } = event.data;
  const start = performance.now();
  const outcome = solveDocument(raw, options, options.verdictFirst ? (ahead) => scope.postMessage({ id, ahead }) : undefined);
  scope.postMessage({ id, outcome, solveMs: performance.now() - start });
};
