import type { SortState } from '@/features/catalogues/components/sort-chips';
import { matchesWords, sortCatalogue } from '@/features/catalogues/sort-values';

import { KIND_LABEL, rthJcKPerW } from './part-format';
import type { Part, PartKind } from './types';

export type PartSortKey = 'name' | 'tjMax' | 'rthJc';
export type KindFilter = PartKind | 'all';

export const PART_SORTS: readonly { key: PartSortKey; label: string }[] = [
  { key: 'name', label: 'Name' },
  { key: 'tjMax', label: 'Tj,max' },
  { key: 'rthJc', label: 'Rθjc' },
];

export const KIND_FILTERS: readonly { value: KindFilter; label: string }[] = [
  { value: 'all', label: 'All kinds' },
  { value: 'regulator', label: 'Regulators' },
  { value: 'bipolar', label: 'Bipolar' },
  { value: 'darlington', label: 'Darlington' },
  { value: 'mosfet', label: 'MOSFET' },
];

const valueOf = (p: Part, key: Exclude<PartSortKey, 'name'>): number => (key === 'tjMax' ? p.tjMaxC : rthJcKPerW(p.thermal));

/** Filters by kind and search words (name, package, kind, description, notes), then sorts. */
export function queryParts(items: readonly Part[], search: string, kind: KindFilter, sort: SortState<PartSortKey>): Part[] {
  const found = items.filter((p) => (kind === 'all' || p.kind === kind) && matchesWords([p.name, p.packageName, KIND_LABEL[p.kind], p.description, p.notes], search));
  return sortCatalogue(found, sort, valueOf);
}
