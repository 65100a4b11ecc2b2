import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/api';
import { applyStudyUpdate, studyPartKey } from '@/features/studies/study-cache';
import type { Study } from '@/features/studies/types';
import type { ReviewInput } from '@/validation';

import type { Review } from './types';

const studyPath = (studyId: number) => `/studies/${encodeURIComponent(studyId)}`;

export function useReviews(studyId: number) {
  return useQuery({
    queryKey: studyPartKey(studyId, 'reviews'),
    queryFn: async () => (await api.get<{ reviews: Review[] }>(`${studyPath(studyId)}/reviews`)).data.reviews,
  });
}

export function useSubmitForReview(studyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => (await api.post<{ study: Study }>(`${studyPath(studyId)}/submit`)).data.study,
    onSuccess: (study) => applyStudyUpdate(queryClient, study),
  });
}

/** A decision on the revision in review; `revision` guards against deciding on one that moved on. */
export function useReviewStudy(studyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ReviewInput) =>
      (await api.post<{ study: Study }>(`${studyPath(studyId)}/review`, input)).data.study,
    onSuccess: (study) => applyStudyUpdate(queryClient, study),
  });
}
