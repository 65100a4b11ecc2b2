import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/api';
import { applyStudyUpdate } from '@/features/studies/study-cache';
import type { Study } from '@/features/studies/types';
import type { StudySaveInput } from '@/validation';

import type { CatalogueSink, LibraryPart } from './catalogue-copy';

/** `PUT /api/studies/:id` with the version the edit started from; 409 when someone saved first. */
export function useSaveStudy(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: StudySaveInput) => (await api.put<{ study: Study }>(`/studies/${id}`, input)).data.study,
    onSuccess: (study) => applyStudyUpdate(queryClient, study),
  });
}

/** The parts library of the study's team (`GET /api/parts`), loaded when the picker opens. */
export function useLibraryParts(teamId: number, enabled: boolean) {
  return useQuery({
    queryKey: ['parts', 'list', teamId],
    queryFn: async () => (await api.get<{ items: LibraryPart[] }>('/parts', { params: { teamId } })).data.items,
    enabled,
  });
}

/** The heatsink catalogue of the study's team (`GET /api/heatsinks`), loaded when the picker opens. */
export function useCatalogueSinks(teamId: number, enabled: boolean) {
  return useQuery({
    queryKey: ['heatsinks', 'list', teamId],
    queryFn: async () => (await api.get<{ items: CatalogueSink[] }>('/heatsinks', { params: { teamId } })).data.items,
    enabled,
  });
}
