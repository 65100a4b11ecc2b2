import { evaluateStudy, INTERACTIVE_MAX_STRETCHES, parseStudy, type StudyDocument, type StudyResult } from '@/core/study';

/** What solving a document gives: the parsed document and its result, or why not. Plain data (it crosses to and from a worker). */
export type SolveOutcome =
  | { kind: 'invalid'; message: string }
  | { kind: 'failed'; message: string }
  | { kind: 'ok'; document: StudyDocument; result: StudyResult };

/** Options of one solve: chart points per node (0 for a verdict only). */
export type SolveOptions = { seriesPoints?: number };

const messageOf = (error: unknown) => (error instanceof Error ? error.message : String(error));

/** Parses and solves a study document with the core's pipeline, within the interactive work budget. */
export function solveDocument(raw: unknown, options: SolveOptions = {}): SolveOutcome {
  let document: StudyDocument;
  try {
    document = parseStudy(raw);
  } catch (error) {
    return { kind: 'invalid', message: messageOf(error) };
  }
  try {
    const result = evaluateStudy(document, { maxStretches: INTERACTIVE_MAX_STRETCHES, ...(options.seriesPoints !== undefined ? { seriesPoints: options.seriesPoints } : {}) });
    return { kind: 'ok', document, result };
  } catch (error) {
    return { kind: 'failed', message: messageOf(error) };
  }
}

/** A request to the solver worker and its reply; `id` tells a reply to the latest request from an outdated one. */
export type SolveRequest = { id: number; raw: unknown; options: SolveOptions };
/** `solveMs`: how long the worker took to parse and solve, ms. */
export type SolveReply = { id: number; outcome: SolveOutcome; solveMs?: number };
