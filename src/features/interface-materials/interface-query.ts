import type { SortState } from '@/features/catalogues/components/sort-chips';
import { matchesWords, sortCatalogue } from '@/features/catalogues/sort-values';

import { areaResistanceKCm2PerW } from './interface-format';
import type { InterfaceMaterial } from './types';

export type InterfaceSortKey = 'name' | 'rth' | 'area';

export const INTERFACE_SORTS: readonly { key: InterfaceSortKey; label: string }[] = [
  { key: 'name', label: 'Name' },
  { key: 'rth', label: 'Rθcs' },
  { key: 'area', label: 'Per cm²' },
];

/** Filters by search words (name, package, notes) and sorts; entries without the value go last. */
export function queryInterfaces(items: readonly InterfaceMaterial[], search: string, sort: SortState<InterfaceSortKey>): InterfaceMaterial[] {
  const found = items.filter((m) => matchesWords([m.name, m.packageName, m.notes], search));
  return sortCatalogue(found, sort, (m, key: Exclude<InterfaceSortKey, 'name'>) => (key === 'rth' ? m.rthKPerW : areaResistanceKCm2PerW(m)));
}
