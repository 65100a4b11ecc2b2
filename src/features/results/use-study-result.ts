import { useMemo } from 'react';

import type { StudyDocument, StudyResult } from '@/core/study';

import type { SolveOutcome } from './solve-outcome';
import { useSolve } from './use-solve';

export type StudyResultState =
  | { kind: 'empty' }
  | { kind: 'solving' }
  | { kind: 'invalid'; message: string; updating?: boolean }
  | { kind: 'failed'; message: string; updating?: boolean }
  | { kind: 'ok'; document: StudyDocument; result: StudyResult; updating?: boolean };

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
 * (the core's default without it).
 */
export function useStudyResult(raw: unknown, seriesPoints?: number): StudyResultState {
  const key = typeof raw === 'object' && raw !== null && !isEmpty(raw) ? raw : null;
  const options = useMemo(() => (seriesPoints === undefined ? {} : { seriesPoints }), [seriesPoints]);
  const { solved, known, remember } = seriesPoints === undefined ? DEFAULT_CACHE : cacheFor(seriesPoints);
  const state = useSolve(key, options, true, known, remember);

  if (isEmpty(raw)) return { kind: 'empty' };
  if (key === null) return { kind: 'invalid', message: 'the study document must be a JSON object' };
  const cached = solved.get(key);
  if (cached) return cached;
  if (state.outcome) return { ...state.outcome, updating: state.updating };
  return { kind: 'solving' };
}
