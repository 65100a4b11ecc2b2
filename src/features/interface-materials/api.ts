import {
  useCatalogueItem,
  useCatalogueList,
  useDeleteCatalogueItem,
  useSaveCatalogueItem,
} from '@/features/catalogues/api';

import type { InterfaceMaterial } from './types';

export const useInterfaceMaterials = (teamId: number | undefined) => useCatalogueList<InterfaceMaterial>('interface-materials', teamId);
export const useInterfaceMaterial = (id: string) => useCatalogueItem<InterfaceMaterial>('interface-materials', id);
export const useSaveInterfaceMaterial = (id?: number) => useSaveCatalogueItem<InterfaceMaterial>('interface-materials', id);
export const useDeleteInterfaceMaterial = () => useDeleteCatalogueItem('interface-materials');
