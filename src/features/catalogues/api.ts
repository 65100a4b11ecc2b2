import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/api';
import { saveTextFile } from '@/components/ui';

import { mappingBody } from './mapping';
import type { CatalogueResource, ImportMapping, ImportPreview, PickedFile } from './types';

export const catalogueKey = (resource: CatalogueResource) => [resource] as const;
const listKey = (resource: CatalogueResource, teamId: number | undefined) => [resource, 'list', teamId ?? 'all'] as const;
const itemKey = (resource: CatalogueResource, id: string) => [resource, 'item', id] as const;

/** The catalogue of one team (or of every team of the member when teamId is undefined). */
export function useCatalogueList<T>(resource: CatalogueResource, teamId: number | undefined) {
  return useQuery({
    queryKey: listKey(resource, teamId),
    queryFn: async () =>
      (await api.get<{ items: T[] }>(`/${resource}`, teamId === undefined ? undefined : { params: { teamId } })).data.items,
  });
}

export function useCatalogueItem<T>(resource: CatalogueResource, id: string) {
  return useQuery({
    queryKey: itemKey(resource, id),
    queryFn: async () => (await api.get<{ item: T }>(`/${resource}/${encodeURIComponent(id)}`)).data.item,
  });
}

/** Creates (no id) or replaces an entry; the lists refetch afterwards. */
export function useSaveCatalogueItem<T extends { id: number }>(resource: CatalogueResource, id?: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: Record<string, unknown>) =>
      id === undefined
        ? (await api.post<{ item: T }>(`/${resource}`, input)).data.item
        : (await api.put<{ item: T }>(`/${resource}/${id}`, input)).data.item,
    onSuccess: (item) => {
      queryClient.setQueryData(itemKey(resource, String(item.id)), item);
      return queryClient.invalidateQueries({ queryKey: [resource, 'list'] });
    },
  });
}

export function useDeleteCatalogueItem(resource: CatalogueResource) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: number) => {
      await api.delete(`/${resource}/${id}`);
      return id;
    },
    onSuccess: (id) => {
      queryClient.removeQueries({ queryKey: itemKey(resource, String(id)) });
      return queryClient.invalidateQueries({ queryKey: [resource, 'list'] });
    },
  });
}

function fileForm(file: PickedFile): FormData {
  const form = new FormData();
  form.append('file', file.blob, file.name);
  return form;
}

/** Columns, first rows and a suggested mapping of a CSV file: nothing is saved. */
export function usePreviewImport(resource: CatalogueResource) {
  return useMutation({
    mutationFn: async (file: PickedFile) => (await api.post<ImportPreview>(`/${resource}/import/preview`, fileForm(file))).data,
  });
}

export type ImportInput = { file: PickedFile; mapping: ImportMapping; teamId?: number };

/** Imports every row of the file or, on any problem, none (400 import_failed lists them). */
export function useImportCsv(resource: CatalogueResource) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ file, mapping, teamId }: ImportInput) => {
      const form = fileForm(file);
      form.append('mapping', JSON.stringify(mappingBody(mapping)));
      if (teamId !== undefined) form.append('teamId', String(teamId));
      return (await api.post<{ imported: number; teamId: number }>(`/${resource}/import`, form)).data;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: [resource, 'list'] }),
  });
}

/** Downloads the team's catalogue as the server writes it (`GET /api/<catalogue>/export.csv`). */
export async function downloadCatalogueCsv(resource: CatalogueResource, teamId: number | undefined): Promise<void> {
  const { data } = await api.get<string>(`/${resource}/export.csv`, {
    params: teamId === undefined ? undefined : { teamId },
    responseType: 'text',
    headers: { Accept: 'text/csv' },
  });
  await saveTextFile(`${resource}.csv`, data);
}
