import { DEFAULT_MARGIN_K, STUDY_FORMAT, STUDY_VERSION, type DefaultSections } from '@/core/study';
import type { Study } from '@/features/studies/types';

import type { EditorValues, RawDocument } from './types';

const isObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * A first document for a study saved without one: one sink, one device and one segment,
 * their values left empty so the problem list says what to fill in (nothing is made up).
 */
export function starterDocument(title: string, description: string, teamDefaults?: DefaultSections | null): RawDocument {
  return {
    format: STUDY_FORMAT,
    version: STUDY_VERSION,
    title,
    description,
    marginK: DEFAULT_MARGIN_K,
    ambient: { temperatureC: '' },
    sinks: [{ id: 'S1', rthKPerW: '' }],
    devices: [{ id: 'Q1', tjMaxC: '', sink: 'S1', package: { kind: 'lumped', rthKPerW: '' }, interface: { rthKPerW: '' } }],
    profile: { segments: [{ durationS: '', powerW: { Q1: '' } }] },
    // The team's defaults as they were when the study was started: explicit values from here on.
    ...copyJson(teamDefaults?.document ?? {}),
  };
}

/** A deep copy of plain JSON, so edits never reach the query cache's objects. */
export const copyJson = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

export function valuesFromStudy(study: Pick<Study, 'title' | 'description' | 'document' | 'teamDefaults'>): EditorValues {
  const raw = study.document;
  const document = isObject(raw) && Object.keys(raw).length > 0 ? (copyJson(raw) as RawDocument) : starterDocument(study.title, study.description, study.teamDefaults);
  return { title: study.title, description: study.description, document };
}

/** The body of `PUT /api/studies/:id` for these values. */
export function saveBody(values: EditorValues, baseVersion: number) {
  return { baseVersion, title: values.title.trim(), description: values.description.trim(), document: copyJson(values.document) };
}
