import { useMemo } from 'react';

import { useSolve } from '@/features/results/use-solve';
import { soaSummary } from '@/features/results/soa-text';
import { studyVerdict, type Verdict } from '@/features/results/verdict';

import type { RawDocument } from './types';

export type LiveVerdict =
  | { kind: 'waiting' }
  | { kind: 'ok'; verdict: Verdict; warnings: readonly string[]; updating: boolean }
  | { kind: 'failed'; message: string; updating: boolean };

/** The verdict needs no chart series. */
const VERDICT_ONLY = { seriesPoints: 0 };

/**
 * The verdict of the checked document, solved off the render path (a Web Worker on the web);
 * the last one stays while the next is solved (`updating`) or while the edits have problems.
 */
export function useLiveVerdict(raw: RawDocument | null, enabled: boolean): LiveVerdict {
  const { outcome, updating } = useSolve(raw, VERDICT_ONLY, enabled);
  // The SOA check in a line under the verdict, as the full results give it.
  const verdict = useMemo(() => {
    if (outcome?.kind !== 'ok') return null;
    const v = studyVerdict(outcome.result);
    const soa = soaSummary(outcome.result.soa);
    return soa ? { ...v, notes: [...v.notes, soa] } : v;
  }, [outcome]);
  if (!outcome) return { kind: 'waiting' };
  if (outcome.kind === 'ok') return { kind: 'ok', verdict: verdict!, warnings: outcome.result.warnings, updating };
  return { kind: 'failed', message: outcome.message, updating };
}
