import { createParseCache } from '@/core/study';

import { receivedDocument, solveDocument, type SolveReply, type SolveRequest } from './solve-outcome';

/**
 * The study solver off the page's main thread (web): each request is parsed and solved with
 * the core's pipeline and answered with its id; with `verdictFirst` the verdict line goes
 * ahead of the full result. Requests leave out the parts kept from the one before (`kept`).
 * Replies are plain data (structured clone).
 */
const scope = self as unknown as { onmessage: ((event: MessageEvent<SolveRequest>) => void) | null; postMessage: (reply: SolveReply) => void };

/** The document of the last request, whose parts the next one may keep. */
let before: unknown = null;
/** Parsed profiles by this worker's copy of the raw profile (a kept profile is the same object). */
const parsed = createParseCache();

scope.onmessage = (event) => {
  const { id, options } = event.data;
  const raw = receivedDocument(event.data, before);
  before = raw;
  const start = performance.now();
  const outcome = solveDocument(raw, options, options.verdictFirst ? (ahead) => scope.postMessage({ id, ahead, solveMs: performance.now() - start }) : undefined, parsed);
  scope.postMessage({ id, outcome, solveMs: performance.now() - start });
};
