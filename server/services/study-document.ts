import crypto from 'node:crypto';
import { evaluateStudy, INTERACTIVE_MAX_STRETCHES, parseStudy, type StudyDocument, type StudyResult } from '../../src/core/study';
import { AppError } from '../errors';

/** The core's parser names the field as "path: reason"; the API reports it under `document.`. */
function toBadRequest(err: Error, prefix: string): AppError {
  const cut = err.message.indexOf(': ');
  const path = cut > 0 ? err.message.slice(0, cut) : 'study';
  const reason = cut > 0 ? err.message.slice(cut + 2) : err.message;
  const full = path === 'study' ? prefix : `${prefix}.${path}`;
  return AppError.badRequest(`${full}: ${reason}`, [{ path: full, message: reason }]);
}

/** Checks a study document with the core's parser; a bad one answers 400 naming its field. */
export function checkDocument(document: unknown, prefix = 'document'): StudyDocument {
  try {
    return parseStudy(document);
  } catch (err) {
    if (err instanceof RangeError || err instanceof TypeError) throw toBadRequest(err, prefix);
    throw err;
  }
}

const CACHE_SIZE = 200;
/**
 * Results by document content: a result depends on nothing else, and solving can take a while.
 * Each server process keeps its own; being keyed by content it is never stale, so processes
 * behind a load balancer need not share it.
 */
const cache = new Map<string, StudyResult>();

/** Parses and solves; solver refusals (too large, no path to ambient) are the client's 400 too. */
export function solveDocument(document: unknown, options: { seriesPoints?: number } = {}): StudyResult {
  const key = crypto.createHash('sha256').update(JSON.stringify(document)).update(`|${options.seriesPoints ?? ''}`).digest('hex');
  const hit = cache.get(key);
  if (hit) {
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const doc = checkDocument(document);
  let result: StudyResult;
  try {
    result = evaluateStudy(doc, { seriesPoints: options.seriesPoints, maxStretches: INTERACTIVE_MAX_STRETCHES });
  } catch (err) {
    if (err instanceof RangeError || err instanceof TypeError) throw toBadRequest(err, 'document');
    throw err;
  }
  cache.set(key, result);
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value!);
  return result;
}
