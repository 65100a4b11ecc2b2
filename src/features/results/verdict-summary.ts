import type { StudyResult } from '@/core/study';

import { shownElsewhere, soaSummary } from './soa-text';
import { studyVerdict, type Verdict } from './verdict';

/**
 * The verdict line of a result as the results and the editor show it: a few hundred bytes, so
 * a worker can send it ahead of (or instead of) the full result of a long profile.
 */
export type VerdictSummary = {
  /** The verdict, the SOA check's line last among its notes when the study has SOA checks. */
  verdict: Verdict;
  /** Every solver warning. */
  warnings: string[];
  /** The warnings the SOA and rail-plan panels do not show in full: the full results list only these above the curves. */
  ownWarnings: string[];
};

export function verdictSummary(result: StudyResult): VerdictSummary {
  const v = studyVerdict(result);
  const soa = soaSummary(result.soa);
  const verdict = soa ? { ...v, notes: [...v.notes, soa] } : v;
  const ownWarnings = result.warnings.filter((w) => !shownElsewhere(w, result.soa, Boolean(result.railPlan)));
  return { verdict, warnings: result.warnings, ownWarnings };
}
