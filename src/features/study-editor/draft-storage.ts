import type { EditorValues } from './types';

/** Unsaved edits of one study, kept with the version they started from. */
export type Draft = { studyId: number; baseVersion: number; savedAt: string; values: EditorValues };

// Native builds keep drafts for the app's lifetime; the web build keeps them in localStorage (draft-storage.web.ts).
const drafts = new Map<string, Draft>();

const keyOf = (studyId: number, baseVersion: number) => `${studyId}.v${baseVersion}`;

export function saveDraft(draft: Draft): void {
  drafts.set(keyOf(draft.studyId, draft.baseVersion), draft);
}

/** The most recent draft of the study, whichever version it started from. */
export function findDraft(studyId: number): Draft | null {
  let found: Draft | null = null;
  for (const draft of drafts.values()) {
    if (draft.studyId === studyId && (!found || draft.savedAt > found.savedAt)) found = draft;
  }
  return found;
}

export function clearDrafts(studyId: number): void {
  for (const [key, draft] of drafts) if (draft.studyId === studyId) drafts.delete(key);
}
