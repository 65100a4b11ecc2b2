import { evaluateStudy, INTERACTIVE_MAX_STRETCHES, parseStudy, type EvaluationCache, type ParseCache, type StudyDocument, type StudyResult } from '@/core/study';

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
 * `cache` keeps parsed profiles for a caller whose raw documents are never changed in place
 * (the worker's own copies), so a kept profile is not parsed again.
 */
export function solveDocument(raw: unknown, options: SolveOptions = {}, ahead?: (summary: VerdictSummary) => void, cache?: ParseCache): SolveOutcome {
  const parsed = parseForSolve(raw, cache);
  return 'document' in parsed ? solveParsed(parsed.document, options, ahead) : parsed;
}

/** The study document checked and with its defaults, or why it is invalid; `cache` as for solveDocument. */
export function parseForSolve(raw: unknown, cache?: ParseCache): { document: StudyDocument } | { kind: 'invalid'; message: string } {
  try {
    return { document: parseStudy(raw, cache) };
  } catch (error) {
    return { kind: 'invalid', message: messageOf(error) };
  }
}

/** solveDocument's solve of a document already parsed; `cache` keeps work across a caller's solves (evaluateStudy's). */
export function solveParsed(document: StudyDocument, options: SolveOptions = {}, ahead?: (summary: VerdictSummary) => void, cache?: EvaluationCache): SolveOutcome {
  // The verdict alone checks SOA points at each device's peak case temperature: the same pass
  // or fail for less work (evaluateStudy's soaCaseTemperature). Where the verdict goes ahead of
  // a full result solved apart from the page, it is solved so first, then the full result.
  const verdictSolve = () => verdictSummary(evaluateStudy(document, { maxStretches: INTERACTIVE_MAX_STRETCHES, seriesPoints: 0, soaCaseTemperature: 'peak', cache }));
  let result: StudyResult;
  try {
    if (options.verdictOnly) return { kind: 'verdict', summary: verdictSolve() };
    if (ahead) ahead(verdictSolve());
    result = evaluateStudy(document, { maxStretches: INTERACTIVE_MAX_STRETCHES, cache, ...(options.seriesPoints !== undefined ? { seriesPoints: options.seriesPoints } : {}) });
  } catch (error) {
    return { kind: 'failed', message: messageOf(error) };
  }
  return { kind: 'ok', summary: verdictSummary(result), result };
}

/**
 * A request to the solver worker; `id` tells a reply to the latest request from an outdated one.
 * `kept` names the document's top-level parts (the profile of a long log, say) that are the
 * same objects as in the request before to the same worker: they are left out of `raw` and the
 * worker takes its own copy from that request (`receivedDocument`), so an edit elsewhere does
 * not copy them across again. `profile`, when an edit changed some of its items, may come as a
 * `profileSplice` instead: the worker's copy of the items before with a middle run replaced.
 */
export type SolveRequest = { id: number; raw: unknown; options: SolveOptions; kept?: string[]; profileSplice?: ProfileSplice };

/**
 * The profile's items as the request before's, its first `head` and last `tail` kept and
 * `middle` between them; `rest`: the profile's other fields (repeat, periodic).
 */
export type ProfileSplice = { head: number; tail: number; middle: unknown[]; rest: Record<string, unknown> };

type Parts = Record<string, unknown>;
const isParts = (value: unknown): value is Parts => typeof value === 'object' && value !== null && !Array.isArray(value);

/** A profile sent as a splice when at least this share of its items are the ones sent before. */
const SPLICE_MIN_KEPT = 0.5;

/** The splice that turns `before`'s profile into `profile`, when most items are the same objects. */
function profileSplice(profile: unknown, before: unknown): ProfileSplice | null {
  if (!isParts(profile) || !isParts(before) || !Array.isArray(profile.segments) || !Array.isArray(before.segments)) return null;
  const now: unknown[] = profile.segments;
  const was: unknown[] = before.segments;
  const most = Math.min(now.length, was.length);
  let head = 0;
  while (head < most && now[head] === was[head]) head++;
  let tail = 0;
  while (tail < most - head && now[now.length - 1 - tail] === was[was.length - 1 - tail]) tail++;
  if (head + tail < SPLICE_MIN_KEPT * now.length) return null;
  const rest: Parts = { ...profile };
  delete rest.segments;
  return { head, tail, middle: now.slice(head, now.length - tail), rest };
}

/** What to post for `raw` when `before` was the document of the request before to the same worker (null for a fresh worker). */
export function requestParts(raw: unknown, before: unknown): { raw: unknown; kept?: string[]; profileSplice?: ProfileSplice } {
  if (!isParts(raw) || !isParts(before)) return { raw };
  const sent: Parts = {};
  const kept: string[] = [];
  let splice: ProfileSplice | null = null;
  for (const [key, value] of Object.entries(raw)) {
    if (typeof value === 'object' && value !== null && before[key] === value) kept.push(key);
    else if (key === 'profile' && (splice = profileSplice(value, before.profile)) !== null) continue;
    else sent[key] = value;
  }
  if (kept.length === 0 && !splice) return { raw };
  return { raw: sent, ...(kept.length > 0 ? { kept } : {}), ...(splice ? { profileSplice: splice } : {}) };
}

/** The document a worker received: `request.raw` with its kept parts (and spliced profile) taken from the document of the request before (`before`). */
export function receivedDocument(request: SolveRequest, before: unknown): unknown {
  const { kept, profileSplice: splice } = request;
  if ((!kept || kept.length === 0) && !splice) return request.raw;
  if (!isParts(request.raw) || !isParts(before)) throw new Error('a request kept parts of a document this worker does not have');
  const raw: Parts = { ...request.raw };
  for (const key of kept ?? []) raw[key] = before[key];
  if (splice) {
    const was = isParts(before.profile) ? before.profile.segments : undefined;
    if (!Array.isArray(was) || splice.head + splice.tail > was.length) throw new Error('a request spliced a profile this worker does not have');
    raw.profile = { ...splice.rest, segments: [...was.slice(0, splice.head), ...splice.middle, ...was.slice(was.length - splice.tail)] };
  }
  return raw;
}
/**
 * The verdict line sent ahead of the outcome (`verdictFirst`), or the outcome; `solveMs`: how
 * long the worker took to parse and solve, ms.
 */
export type SolveReply = { id: number; ahead: VerdictSummary; solveMs?: number } | { id: number; outcome: SolveOutcome; solveMs?: number };
