import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/api';
import type { StudyCreateInput } from '@/validation';

import type { Study, StudySummary } from './types';

export const studiesKey = ['studies'] as const;
export const studyKey = (id: string) => ['studies', 'detail', id] as const;

export function useStudies() {
  return useQuery({
    queryKey: studiesKey,
    queryFn: async () => (await api.get<{ studies: StudySummary[] }>('/studies')).data.studies,
  });
}

export function useStudy(id: string) {
  return useQuery({
    queryKey: studyKey(id),
    queryFn: async () => (await api.get<{ study: Study }>(`/studies/${encodeURIComponent(id)}`)).data.study,
  });
}

export function useCreateStudy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: StudyCreateInput) => (await api.post<{ study: Study }>('/studies', input)).data.study,
    onSuccess: (study) => {
      queryClient.setQueryData(studyKey(String(study.id)), study);
      return queryClient.invalidateQueries({ queryKey: studiesKey, exact: true });
    },
  });
}
