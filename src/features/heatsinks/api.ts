import {
  useCatalogueItem,
  useCatalogueList,
  useDeleteCatalogueItem,
  useSaveCatalogueItem,
} from '@/features/catalogues/api';

import type { Heatsink } from './types';

export const useHeatsinks = (teamId: number | undefined) => useCatalogueList<Heatsink>('heatsinks', teamId);
export const useHeatsink = (id: string) => useCatalogueItem<Heatsink>('heatsinks', id);
export const useSaveHeatsink = (id?: number) => useSaveCatalogueItem<Heatsink>('heatsinks', id);
export const useDeleteHeatsink = () => useDeleteCatalogueItem('heatsinks');
