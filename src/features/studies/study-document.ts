import { parseStudy, type StudyDocument } from '@/core/study';

export type DocumentState =
  | { kind: 'empty' }
  | { kind: 'invalid'; message: string }
  | { kind: 'ok'; document: StudyDocument };

function isEmpty(raw: unknown): boolean {
  if (raw === null || raw === undefined) return true;
  return typeof raw === 'object' && !Array.isArray(raw) && Object.keys(raw).length === 0;
}

/**
 * Reads a saved study document with the core's own parser, so the view shows what a
 * solve would use (defaults filled in, groups expanded) or the parser's field-named error.
 */
export function readStudyDocument(raw: unknown): DocumentState {
  if (isEmpty(raw)) return { kind: 'empty' };
  try {
    return { kind: 'ok', document: parseStudy(raw) };
  } catch (error) {
    return { kind: 'invalid', message: error instanceof Error ? error.message : String(error) };
  }
}
