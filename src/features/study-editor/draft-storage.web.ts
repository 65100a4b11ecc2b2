import type { EditorValues } from './types';

/** Unsaved edits of one study, kept with the version they started from. */
export type Draft = { studyId: number; baseVersion: number; savedAt: string; values: EditorValues };

const PREFIX = 'junctura.studyDraft.';
const keyOf = (studyId: number, baseVersion: number) => `${PREFIX}${studyId}.v${baseVersion}`;

// Storage can be blocked (private modes) or full: then drafts last as long as the page.
function keys(studyId: number): string[] {
  try {
    const out: string[] = [];
    for (let i = 0; i < window.localStorage.length; i++) {
      const key = window.localStorage.key(i);
      if (key?.startsWith(`${PREFIX}${studyId}.v`)) out.push(key);
    }
    return out;
  } catch {
    return [];
  }
}

export function saveDraft(draft: Draft): void {
  try {
    window.localStorage.setItem(keyOf(draft.studyId, draft.baseVersion), JSON.stringify(draft));
  } catch {
    // Not kept; the edits stay in the open page.
  }
}

function read(key: string): Draft | null {
  try {
    const raw = window.localStorage.getItem(key);
    const draft = raw === null ? null : (JSON.parse(raw) as Draft);
    return draft && typeof draft.baseVersion === 'number' && typeof draft.values === 'object' ? draft : null;
  } catch {
    return null;
  }
}

/** The most recent draft of the study, whichever version it started from. */
export function findDraft(studyId: number): Draft | null {
  let found: Draft | null = null;
  for (const key of keys(studyId)) {
    const draft = read(key);
    if (draft && (!found || draft.savedAt > found.savedAt)) found = draft;
  }
  return found;
}

export function clearDrafts(studyId: number): void {
  try {
    for (const key of keys(studyId)) window.localStorage.removeItem(key);
  } catch {
    // Nothing to clear.
  }
}
