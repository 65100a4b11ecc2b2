import { evaluateStudy, INTERACTIVE_MAX_STRETCHES, parseStudy, type StudyDocument, type StudyResult } from '@/core/study';

import { verdictSummary, type VerdictSummary } from './verdict-summary';

/**
 * What solving a document gives: the result with its verdict line, the verdict line alone (when
 * asked for with `verdictOnly`), or why not. Plain data (it crosses to and from a worker); the
 * parsed document stays where it was parsed, so a reply does not carry the profile back.
 */
export type SolveOutcome =
  | { kind: 'invalid'; message: string }
  | { kind: 'failed'; message: string }
  | { kind: 'ok'; summary: VerdictSummary; result: StudyResult }
  | { kind: 'verdict'; summary: VerdictSummary };

/**
 * Options of one solve: chart points per node (0 for none); `verdictOnly` answers the verdict
 * line without the full result; `verdictFirst` sends the verdict line ahead of the full result
 * where the solve runs apart from the page (a worker).
 */
export type SolveOptions = { seriesPoints?: number; verdictOnly?: boolean; verdictFirst?: boolean };

const messageOf = (error: unknown) => (error instanceof Error ? error.message : String(error));

/**
 * Parses and solves a study document with the core's pipeline, within the interactive work
 * budget. `ahead` is handed the verdict line as soon as it is known, before the outcome is returned.
 */
export function solveDocument(raw: unknown, options: SolveOptions = {}, ahead?: (summary: VerdictSummary) => void): SolveOutcome {
  let document: StudyDocument;
  try {
    document = parseStudy(raw);
  } catch (error) {
    return { kind: 'invalid', message: messageOf(error) };
  }
  let result: StudyResult;
  try {
    result = evaluateStudy(document, { maxStretches: INTERACTIVE_MAX_STRETCHES, ...(options.seriesPoints !== undefined ? { seriesPoints: options.seriesPoints } : {}) });
  } catch (error) {
    return { kind: 'failed', message: messageOf(error) };
  }
  const summary = verdictSummary(result);
  if (options.verdictOnly) return { kind: 'verdict', summary };
  ahead?.(summary);
  return { kind: 'ok', summary, result };
}

/** A request to the solver worker and its reply; `id` tells a reply to the latest request from an outdated one. */
export type SolveRequest = { id: number; raw: unknown; options: SolveOptions };
/**
 * The verdict line sent ahead of the outcome (`verdictFirst`), or the outcome; `solveMs`: how
 * long the worker took to parse and solve, ms.
 */
export type SolveReply = { id: number; ahead: VerdictSummary } | { id: number; outcome: SolveOutcome; solveMs?: number };
