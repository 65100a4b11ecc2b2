import { ValidationError } from 'yup';

import { parseStudy, STUDY_FORMAT, STUDY_VERSION, type StudyDocument } from '@/core/study';
import { formatNumber } from '@/features/studies/quantity-format';
import { studyCreateSchema } from '@/validation';

import { STUDY_FILE_MAX_BYTES } from './study-file';

/** A study file read and checked, ready to become a new study; or why it cannot. */
export type StudyFileCheck =
  | { kind: 'refused'; message: string }
  | { kind: 'invalid'; message: string }
  | { kind: 'ok'; title: string; description: string; document: Record<string, unknown>; parsed: StudyDocument };

const megabytes = (bytes: number) => `${formatNumber(bytes / (1024 * 1024))} MB`;

/** Size first, so a huge file is never read into memory. */
export function checkStudyFileSize(size: number): StudyFileCheck | null {
  if (size <= STUDY_FILE_MAX_BYTES) return null;
  return {
    kind: 'refused',
    message: `The file is ${megabytes(size)}; a study file can be at most ${megabytes(STUDY_FILE_MAX_BYTES)}.`,
  };
}

/**
 * Reads a study file (docs/study-format.md) with the core's own parser. Files of another
 * format or version are refused with a plain message; a bad field is named as the parser
 * names it ("devices[1].package.terms[0].tauS: must be greater than zero, got -0.002 s").
 */
export function readStudyFile(text: string): StudyFileCheck {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return { kind: 'refused', message: `The file is not JSON: ${error instanceof Error ? error.message : String(error)}.` };
  }
  if (typeof json !== 'object' || json === null || Array.isArray(json)) {
    return { kind: 'refused', message: 'The file is not a study file: it holds no JSON object.' };
  }
  const raw = json as Record<string, unknown>;
  if (raw.format !== STUDY_FORMAT) {
    const found = raw.format === undefined ? 'has no "format" field' : `has "format": ${JSON.stringify(raw.format)}`;
    return { kind: 'refused', message: `This is not a Junctura study file: it ${found}, where a study file has "format": "${STUDY_FORMAT}".` };
  }
  if (raw.version !== STUDY_VERSION) {
    const found = raw.version === undefined ? 'gives no version' : `is version ${JSON.stringify(raw.version)}`;
    return { kind: 'refused', message: `This study file ${found}; Junctura reads study files of version ${STUDY_VERSION} only.` };
  }
  let parsed: StudyDocument;
  try {
    parsed = parseStudy(raw);
  } catch (error) {
    return { kind: 'invalid', message: error instanceof Error ? error.message : String(error) };
  }
  // The title and description become the study's own, under the same limits as a new study.
  try {
    const checked = studyCreateSchema.validateSync({ title: parsed.title, description: parsed.description });
    return { kind: 'ok', title: checked.title, description: checked.description, document: raw, parsed };
  } catch (error) {
    if (error instanceof ValidationError) {
      return { kind: 'invalid', message: error.message };
    }
    throw error;
  }
}
