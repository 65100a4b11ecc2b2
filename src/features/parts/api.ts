import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/api';
import { saveTextFile } from '@/components/ui';
import { mappingBody } from '@/features/catalogues/mapping';
import type { ImportMapping, ImportPreview, PickedFile } from '@/features/catalogues/types';

import type { Part, SoaCurveJson, ZthFitResponse } from './types';

const listKey = (teamId: number | undefined) => ['parts', 'list', teamId ?? 'all'] as const;
const itemKey = (id: string) => ['parts', 'item', id] as const;

/** The parts library of one team (or of every team of the member when teamId is undefined). */
export function useParts(teamId: number | undefined) {
  return useQuery({
    queryKey: listKey(teamId),
    queryFn: async () => (await api.get<{ items: Part[] }>('/parts', teamId === undefined ? undefined : { params: { teamId } })).data.items,
  });
}

export function usePart(id: string) {
  return useQuery({
    queryKey: itemKey(id),
    queryFn: async () => (await api.get<{ item: Part }>(`/parts/${encodeURIComponent(id)}`)).data.item,
  });
}

/** Creates (no id) or replaces a part; the lists refetch afterwards. */
export function useSavePart(id?: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: Record<string, unknown>) =>
      id === undefined ? (await api.post<{ item: Part }>('/parts', input)).data.item : (await api.put<{ item: Part }>(`/parts/${id}`, input)).data.item,
    onSuccess: (item) => {
      queryClient.setQueryData(itemKey(String(item.id)), item);
      return queryClient.invalidateQueries({ queryKey: ['parts', 'list'] });
    },
  });
}

export function useDeletePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: number) => {
      await api.delete(`/parts/${id}`);
      return id;
    },
    onSuccess: (id) => {
      queryClient.removeQueries({ queryKey: itemKey(String(id)) });
      return queryClient.invalidateQueries({ queryKey: ['parts', 'list'] });
    },
  });
}

function fileForm(file: PickedFile, fields: Record<string, string> = {}): FormData {
  const form = new FormData();
  form.append('file', file.blob, file.name);
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  return form;
}

/** Zth(t) points of a CSV and the Foster set fitted to them; nothing is saved. */
export function useFitZth() {
  return useMutation({
    mutationFn: async ({ file, perDecade }: { file: PickedFile; perDecade?: number }) =>
      (await api.post<ZthFitResponse>('/parts/zth-fit', fileForm(file, perDecade === undefined ? {} : { perDecade: String(perDecade) }))).data,
  });
}

/** SOA boundary points of a CSV, one curve per pulse width; nothing is saved. */
export function useSoaPointsCsv() {
  return useMutation({
    mutationFn: async (file: PickedFile) => (await api.post<{ curves: SoaCurveJson[] }>('/parts/soa-points', fileForm(file))).data.curves,
  });
}

export function usePreviewPartImport() {
  return useMutation({
    mutationFn: async (file: PickedFile) => (await api.post<ImportPreview>('/parts/import/preview', fileForm(file))).data,
  });
}

/** Imports every row or, on any problem, none (400 import_failed lists them). */
export function useImportParts() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ file, mapping, teamId }: { file: PickedFile; mapping: ImportMapping; teamId?: number }) =>
      (
        await api.post<{ imported: number; teamId: number }>(
          '/parts/import',
          fileForm(file, { mapping: JSON.stringify(mappingBody(mapping)), ...(teamId === undefined ? {} : { teamId: String(teamId) }) }),
        )
      ).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['parts', 'list'] }),
  });
}

/** Downloads the team's parts as the server writes them (`GET /api/parts/export.csv`). */
export async function downloadPartsCsv(teamId: number | undefined): Promise<void> {
  const { data } = await api.get<string>('/parts/export.csv', {
    params: teamId === undefined ? undefined : { teamId },
    responseType: 'text',
    headers: { Accept: 'text/csv' },
  });
  await saveTextFile('parts.csv', data);
}
