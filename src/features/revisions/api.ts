import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/api';
import { applyStudyUpdate, studyPartKey } from '@/features/studies/study-cache';
import type { Study } from '@/features/studies/types';

import type { RevisionSummary, RevisionView } from './types';

const studyPath = (studyId: number | string) => `/studies/${encodeURIComponent(studyId)}`;

export const revisionsKey = (studyId: number | string) => studyPartKey(studyId, 'revisions');

export function useRevisions(studyId: number | string) {
  return useQuery({
    queryKey: revisionsKey(studyId),
    queryFn: async () =>
      (await api.get<{ revisions: RevisionSummary[] }>(`${studyPath(studyId)}/revisions`)).data.revisions,
  });
}

export function useRevision(studyId: number | string, number: number | string) {
  return useQuery({
    queryKey: [...revisionsKey(studyId), String(number)],
    queryFn: async () =>
      (await api.get<RevisionView>(`${studyPath(studyId)}/revisions/${encodeURIComponent(number)}`)).data,
  });
}

/** Restores an old revision as a new one; `baseVersion` is the version the user saw as current. */
export function useRestoreRevision(studyId: number | string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ number, baseVersion }: { number: number; baseVersion: number }) =>
      (await api.post<{ study: Study }>(`${studyPath(studyId)}/revisions/${encodeURIComponent(number)}/restore`, { baseVersion }))
        .data.study,
    onSuccess: (study) => applyStudyUpdate(queryClient, study),
  });
}
