import { createParseCache, parseStudy, type StudyDocument } from '@/core/study';

import { inDocument } from './field-path';

/** One thing wrong with the study being edited, at a form field (`document.devices[0].sink`). */
export type Problem = { field: string; reason: string };

export type DocumentCheck = { ok: true; document: StudyDocument } | { ok: false; problem: Problem };

/**
 * Splits the parser's "path: reason" message. Its paths hold ids, indices and field names
 * only, never ": ", so the first ": " ends the path; "study" names the document itself.
 */
export function splitParserMessage(message: string): Problem {
  const cut = message.indexOf(': ');
  if (cut < 0) return { field: inDocument(''), reason: message };
  const path = message.slice(0, cut);
  return { field: inDocument(path === 'study' ? '' : path), reason: message.slice(cut + 2) };
}

/**
 * Parsed profiles of the documents checked so far: the form's values change by copies along
 * the edited path (formik's setIn), so an edit elsewhere leaves the profile object as it was
 * and a long logged profile is not read again on every keystroke.
 */
const parsed = createParseCache();

/** Runs the study parser (the one the server and the command line use) on the edited document. */
export function checkDocument(document: unknown): DocumentCheck {
  try {
    return { ok: true, document: parseStudy(document, parsed) };
  } catch (error) {
    if (error instanceof TypeError || error instanceof RangeError) return { ok: false, problem: splitParserMessage(error.message) };
    throw error;
  }
}
