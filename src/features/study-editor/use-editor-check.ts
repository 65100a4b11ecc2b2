import { getIn, setIn } from 'formik';
import { useLayoutEffect, useRef, useState, type RefObject } from 'react';

import type { StudyDocument } from '@/core/study';

import { checkDocument, type Problem } from './check-document';
import type { FieldMeta } from './editor-context';
import { readText } from './quantity-text';
import type { EditorValues, RawDocument } from './types';

export type EditorCheck = {
  problems: Problem[];
  /** The parsed document when it has no problems, and the edited object it came from. */
  parsed: { document: StudyDocument; raw: RawDocument } | null;
};

/**
 * How long typing may pause before the document is checked again, ms. An edit after a longer
 * pause is checked at once (the next task), so a single change reaches the results without
 * waiting; the keystrokes of a burst are checked once it pauses.
 */
export const CHECK_DELAY_MS = 100;

/**
 * A check at once that took at most this long the last time (ms) runs in the edit's own
 * commit, before the browser paints, so its document goes to the solver without waiting a
 * frame; a longer one (a profile edit on a long log) runs in the next task, so the edit paints first.
 */
export const INLINE_CHECK_MS = 8;

/** When the check of an edit made at `at` runs, ms from then: at once after a pause since `lastChange`, else after CHECK_DELAY_MS. */
export const checkDelay = (at: number, lastChange: number) => (at - lastChange >= CHECK_DELAY_MS ? 0 : CHECK_DELAY_MS);

const now = () => globalThis.performance?.now() ?? Date.now();

/**
 * Everything wrong with the values: each numeric field whose text does not read (with the
 * reader's reason), an empty title, and the study parser's finding, which names its field.
 * The parser stops at its first finding, so fields already reported as unreadable are given
 * their saved value (`base`) for its run, letting it report a problem further on.
 */
export function checkValues(values: EditorValues, fields: ReadonlyMap<string, FieldMeta>, base?: EditorValues): EditorCheck {
  const problems: Problem[] = [];
  let masked = values;
  if (values.title.trim() === '') {
    problems.push({ field: 'title', reason: 'must not be empty' });
    // The document's title follows the study's; one report of the empty title is enough.
    masked = setIn(masked, 'document.title', base?.document.title || base?.title || 'untitled');
  }
  for (const [field, meta] of fields) {
    const value: unknown = getIn(values, field);
    if (meta.kind === undefined || typeof value !== 'string') continue;
    const read = readText(value, meta.kind);
    problems.push({ field, reason: read.ok ? 'is not applied yet: type it again' : read.reason });
    const saved: unknown = base ? getIn(base, field) : undefined;
    if (typeof saved === 'number') masked = setIn(masked, field, saved);
  }
  const check = checkDocument(masked.document);
  if (!check.ok) {
    if (!problems.some((p) => p.field === check.problem.field)) problems.push(check.problem);
    return { problems, parsed: null };
  }
  return { problems, parsed: problems.length === 0 ? { document: check.document, raw: values.document } : null };
}

export type EditorCheckState = EditorCheck & {
  /** The last check without problems, kept while the edits have some (for the results). */
  lastGood: EditorCheck['parsed'];
};

const sameProblems = (a: readonly Problem[], b: readonly Problem[]) => a.length === b.length && a.every((p, i) => p.field === b[i].field && p.reason === b[i].reason);

/**
 * Checks the values after each change (the fields on screen are known by then): at once after
 * a pause (in the edit's commit when checks are quick, INLINE_CHECK_MS), else once typing pauses.
 */
export function useEditorCheck(values: EditorValues, fields: RefObject<Map<string, FieldMeta>>, base: EditorValues): EditorCheckState {
  const [state, setState] = useState<EditorCheckState>(() => {
    const first = checkValues(values, new Map());
    return { ...first, lastGood: first.parsed };
  });
  const lastChange = useRef(-Infinity);
  /** How long the last check took, ms (the first one runs in a task of its own). */
  const lastCheckMs = useRef(Infinity);
  useLayoutEffect(() => {
    const at = now();
    const delay = checkDelay(at, lastChange.current);
    lastChange.current = at;
    const run = () => {
      const started = now();
      const next = checkValues(values, fields.current ?? new Map(), base);
      lastCheckMs.current = now() - started;
      // The same findings keep the same list, so the fields reading them do not draw again.
      setState((prev) => ({ ...next, problems: sameProblems(prev.problems, next.problems) ? prev.problems : next.problems, lastGood: next.parsed ?? prev.lastGood }));
    };
    if (delay === 0 && lastCheckMs.current <= INLINE_CHECK_MS) {
      run();
      return;
    }
    const timer = setTimeout(run, delay);
    return () => clearTimeout(timer);
  }, [values, fields, base]);
  return state;
}
