import { useEffect, useState } from 'react';

import { evaluateStudy, INTERACTIVE_MAX_STRETCHES, parseStudy, type StudyDocument, type StudyResult } from '@/core/study';

export type StudyResultState =
  | { kind: 'empty' }
  | { kind: 'solving' }
  | { kind: 'invalid'; message: string }
  | { kind: 'failed'; message: string }
  | { kind: 'ok'; document: StudyDocument; result: StudyResult };

type Outcome = Exclude<StudyResultState, { kind: 'empty' } | { kind: 'solving' }>;

// Keyed by the saved document object: the query cache hands back the same object until it changes.
const solved = new WeakMap<object, Outcome>();

function isEmpty(raw: unknown): raw is null | undefined {
  if (raw === null || raw === undefined) return true;
  return typeof raw === 'object' && !Array.isArray(raw) && Object.keys(raw).length === 0;
}

const messageOf = (error: unknown) => (error instanceof Error ? error.message : String(error));

function solve(raw: unknown): Outcome {
  let document: StudyDocument;
  try {
    document = parseStudy(raw);
  } catch (error) {
    return { kind: 'invalid', message: messageOf(error) };
  }
  try {
    return { kind: 'ok', document, result: evaluateStudy(document, { maxStretches: INTERACTIVE_MAX_STRETCHES }) };
  } catch (error) {
    return { kind: 'failed', message: messageOf(error) };
  }
}

/**
 * Solves a saved study document in the client with the core's own pipeline. The solve runs
 * after the first paint (a timer, not the render), so the page shows "solving" instead of
 * freezing on a long profile; each document object is solved once.
 */
export function useStudyResult(raw: unknown): StudyResultState {
  const key = typeof raw === 'object' && raw !== null ? raw : null;
  const [state, setState] = useState<{ key: object | null; outcome: Outcome } | null>(null);

  useEffect(() => {
    if (key === null || isEmpty(key) || solved.has(key)) return;
    let live = true;
    const timer = setTimeout(() => {
      const outcome = solve(key);
      solved.set(key, outcome);
      if (live) setState({ key, outcome });
    }, 0);
    return () => {
      live = false;
      clearTimeout(timer);
    };
  }, [key]);

  if (isEmpty(raw)) return { kind: 'empty' };
  if (key === null) return { kind: 'invalid', message: 'the study document must be a JSON object' };
  const cached = solved.get(key);
  if (cached) return cached;
  if (state?.key === key) return state.outcome;
  return { kind: 'solving' };
}
