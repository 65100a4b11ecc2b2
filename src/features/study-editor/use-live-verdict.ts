import { useSolve } from '@/features/results/use-solve';
import type { Verdict } from '@/features/results/verdict';

import type { RawDocument } from './types';

export type LiveVerdict =
  | { kind: 'waiting' }
  | { kind: 'ok'; verdict: Verdict; warnings: readonly string[]; updating: boolean }
  | { kind: 'failed'; message: string; updating: boolean };

/** The verdict line alone: no chart series, and the worker sends back only the line, not the result of every segment. */
const VERDICT_ONLY = { seriesPoints: 0, verdictOnly: true };

/**
 * The verdict of the checked document, solved off the render path (a Web Worker on the web);
 * the last one stays while the next is solved (`updating`) or while the edits have problems.
 */
export function useLiveVerdict(raw: RawDocument | null, enabled: boolean): LiveVerdict {
  const { outcome, updating } = useSolve(raw, VERDICT_ONLY, enabled);
  if (!outcome) return { kind: 'waiting' };
  // The SOA check is the verdict's last note, as the full results give it.
  if (outcome.kind === 'ok' || outcome.kind === 'verdict') return { kind: 'ok', verdict: outcome.summary.verdict, warnings: outcome.summary.warnings, updating };
  return { kind: 'failed', message: outcome.message, updating };
}
