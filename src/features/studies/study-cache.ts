import type { QueryClient } from '@tanstack/react-query';

import { studiesKey, studyKey } from './api';
import type { Study } from './types';

/** Key of something that belongs to one study (its revisions, reviews, comments). */
export const studyPartKey = (id: number | string, part: string) => [...studyKey(String(id)), part] as const;

/**
 * After a change answered with the new study: show it at once, then refresh everything
 * derived from studies (the list, the study's revisions, reviews and comments).
 */
export async function applyStudyUpdate(queryClient: QueryClient, study: Study): Promise<void> {
  queryClient.setQueryData(studyKey(String(study.id)), study);
  await queryClient.invalidateQueries({ queryKey: studiesKey });
}
