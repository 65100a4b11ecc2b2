import { titleSlug } from '@/charts/curves-csv';
import { STUDY_FORMAT, STUDY_VERSION } from '@/core/study';

import type { Study } from '@/features/studies/types';

/** Study files larger than this are refused before they are read. */
export const STUDY_FILE_MAX_BYTES = 2 * 1024 * 1024;

const isObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** True when the study holds a document worth exporting (a new study starts with none). */
export function hasDocument(study: Pick<Study, 'document'>): boolean {
  return isObject(study.document) && Object.keys(study.document).length > 0;
}

/**
 * The study as a file of our own format (docs/study-format.md): its saved document with the
 * study's current title and description, which are what an import names the new study by.
 */
export function studyFileText(study: Pick<Study, 'title' | 'description' | 'document'>): string {
  const document = isObject(study.document) ? study.document : {};
  // The saved title and description give way to the study's own, which may have been renamed since.
  const { format, version, title: _title, description: _description, ...rest } = document;
  const file = {
    format: format ?? STUDY_FORMAT,
    version: version ?? STUDY_VERSION,
    title: study.title,
    description: study.description,
    ...rest,
  };
  return `${JSON.stringify(file, null, 2)}\n`;
}

/** A file name from the study title: "bench-load-two-mosfets.json". */
export function studyFileName(title: string): string {
  return `${titleSlug(title)}.json`;
}
