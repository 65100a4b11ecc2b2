import { useEffect, useState } from 'react';

import { evaluateStudy, INTERACTIVE_MAX_STRETCHES, type StudyDocument } from '@/core/study';
import { studyVerdict, type Verdict } from '@/features/results/verdict';

export type LiveVerdict =
  | { kind: 'waiting' }
  | { kind: 'ok'; verdict: Verdict; warnings: readonly string[]; document: StudyDocument }
  | { kind: 'failed'; message: string; document: StudyDocument };

/**
 * The verdict of the checked document, solved with the core's pipeline after the first paint
 * (a timer), the last one kept while the next is solved or while the edits have problems.
 */
export function useLiveVerdict(document: StudyDocument | null, enabled: boolean): LiveVerdict {
  const [state, setState] = useState<LiveVerdict>({ kind: 'waiting' });
  useEffect(() => {
    if (!enabled || document === null) return;
    const timer = setTimeout(() => {
      try {
        const result = evaluateStudy(document, { seriesPoints: 0, maxStretches: INTERACTIVE_MAX_STRETCHES });
        setState({ kind: 'ok', verdict: studyVerdict(result), warnings: result.warnings, document });
      } catch (error) {
        setState({ kind: 'failed', message: error instanceof Error ? error.message : String(error), document });
      }
    }, 0);
    return () => clearTimeout(timer);
  }, [document, enabled]);
  return state;
}
