import { useMemo } from 'react';

import type { StudyResult } from '@/core/study';

import type { SolveOutcome } from './solve-outcome';
import { useSolve } from './use-solve';
import type { VerdictSummary } from './verdict-summary';

export type StudyResultState =
  | { kind: 'empty' }
  | { kind: 'solving' }
  | { kind: 'invalid'; message: string; updating?: boolean }
  | { kind: 'failed'; message: string; updating?: boolean }
  | { kind: 'ok'; summary: VerdictSummary; result: StudyResult; updating?: boolean }
  /** `verdictFirst`: the new document's verdict line while its full result is on the way (`updating`); `previous` is the last full result. */
  | { kind: 'verdict'; summary: VerdictSummary; previous: StudyResult | null; updating: boolean };

// Keyed by the document object (the query cache hands back the same object until it changes), per chart resolution.
const caches = new Map<string, WeakMap<object, SolveOutcome>>();
function cacheFor(seriesPoints: number | undefined) {
  const key = String(seriesPoints ?? 'default');
  let cache = caches.get(key);
  if (!cache) caches.set(key, (cache = new WeakMap()));
  return { solved: cache, known: (raw: object) => cache.get(raw), remember: (raw: object, outcome: SolveOutcome) => void cache.set(raw, outcome) };
}
const DEFAULT_CACHE = cacheFor(undefined);

function isEmpty(raw: unknown): raw is null | undefined {
  if (raw === null || raw === undefined) return true;
  return typeof raw === 'object' && !Array.isArray(raw) && Object.keys(raw).length === 0;
}


/**
 * Solves a study document in the client with the core's own pipeline, off the render path (a
 * Web Worker on the web). Each document object is solved once; while a newer one is solved
 * the last result stays on screen, marked `updating`. `seriesPoints` bounds the chart series
 * (the core's default without it); `verdictFirst` shows the new verdict line as soon as the
 * worker has it, ahead of the full result (the `verdict` state).
 */
export function useStudyResult(raw: unknown, seriesPoints?: number, verdictFirst = false): StudyResultState {
  const key = typeof raw === 'object' && raw !== null && !isEmpty(raw) ? raw : null;
  const options = useMemo(() => (seriesPoints === undefined ? {} : { seriesPoints }), [seriesPoints]);
  const { solved, known, remember } = seriesPoints === undefined ? DEFAULT_CACHE : cacheFor(seriesPoints);
  // With verdictFirst the verdict line has a solver (a worker) of its own: it is not held up
  // behind the full result of an earlier edit, and a newer edit never has to end a busy worker
  // to get its verdict. A full result known already answers it too. The full solve of a
  // document starts once its verdict line is in, so the two do not share the processor.
  const verdict = useSolve(key, VERDICT_ONLY, verdictFirst, (doc) => known(doc) ?? VERDICTS.get(doc), (doc, outcome) => void VERDICTS.set(doc, outcome));
  const state = useSolve(key, options, !verdictFirst || verdict.solvedFor === key, known, remember);

  if (isEmpty(raw)) return { kind: 'empty' };
  if (key === null) return { kind: 'invalid', message: 'the study document must be a JSON object' };
  const cached = solved.get(key);
  if (cached) return asState(cached, false);
  if (verdictFirst) {
    // A document's full solve follows its verdict line, so a line for another document than
    // the full result's is the newer of the two: shown (still updating) over the older result.
    const line = verdict.outcome;
    if (line && (line.kind === 'verdict' || line.kind === 'ok') && verdict.solvedFor !== state.solvedFor) {
      return { kind: 'verdict', summary: line.summary, previous: state.outcome?.kind === 'ok' ? state.outcome.result : null, updating: true };
    }
    if (state.outcome) return asState(state.outcome, state.solvedFor !== key);
    return { kind: 'solving' };
  }
  if (state.outcome) return asState(state.outcome, state.updating);
  return { kind: 'solving' };
}

const VERDICT_ONLY = { verdictOnly: true } as const;
/** Verdict lines by document object, for the verdict solver of useStudyResult. */
const VERDICTS = new WeakMap<object, SolveOutcome>();

function asState(outcome: SolveOutcome, updating: boolean): StudyResultState {
  // Not asked for here (`verdictOnly`), but a verdict-only outcome is complete as it is.
  if (outcome.kind === 'verdict') return { kind: 'verdict', summary: outcome.summary, previous: null, updating };
  return { ...outcome, updating };
}
