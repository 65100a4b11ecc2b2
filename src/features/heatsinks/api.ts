import { keepPreviousData, useQuery } from '@tanstack/react-query';

import { api } from '@/api';
import {
  useCatalogueItem,
  useCatalogueList,
  useDeleteCatalogueItem,
  useSaveCatalogueItem,
} from '@/features/catalogues/api';

import type { RankingQuery, RankingResponse } from './ranking-types';
import type { Heatsink } from './types';

export const useHeatsinks = (teamId: number | undefined) => useCatalogueList<Heatsink>('heatsinks', teamId);
export const useHeatsink = (id: string) => useCatalogueItem<Heatsink>('heatsinks', id);
export const useSaveHeatsink = (id?: number) => useSaveCatalogueItem<Heatsink>('heatsinks', id);
export const useDeleteHeatsink = () => useDeleteCatalogueItem('heatsinks');

/** Query parameters of the ranking endpoint; values left out keep the study's own. */
export function rankingParams(q: RankingQuery): Record<string, string> {
  const params: Record<string, string> = { sink: q.sink, sort: q.sort, airSpeed: String(q.airSpeedMPerS ?? 0) };
  if (q.ambientC !== null) params.ambientC = String(q.ambientC);
  if (q.marginK !== null) params.marginK = String(q.marginK);
  return params;
}

/**
 * The team's heatsinks ranked on a saved study's profile (`GET /api/studies/:id/ranking`). The
 * version is part of the key: a new save ranks again. The last answer stays on screen while a
 * changed what-if is being ranked.
 */
export function useSinkRanking(studyId: number, version: number, query: RankingQuery | null) {
  return useQuery({
    queryKey: ['studies', 'ranking', studyId, version, query],
    enabled: query !== null,
    placeholderData: keepPreviousData,
    queryFn: async () => (await api.get<RankingResponse>(`/studies/${studyId}/ranking`, { params: rankingParams(query!) })).data,
  });
}
