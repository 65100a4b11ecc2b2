import type { SortState } from '@/features/catalogues/components/sort-chips';
import { matchesWords, sortCatalogue } from '@/features/catalogues/sort-values';

import type { Heatsink } from './types';

export type HeatsinkSortKey = 'name' | 'rth' | 'mass' | 'volume' | 'price';

export const HEATSINK_SORTS: readonly { key: HeatsinkSortKey; label: string }[] = [
  { key: 'name', label: 'Name' },
  { key: 'rth', label: 'Rθsa' },
  { key: 'mass', label: 'Mass' },
  { key: 'volume', label: 'Volume' },
  { key: 'price', label: 'Price' },
];

/** Envelope volume W × L × H in mm³, or null when a dimension is missing. */
export function volumeMm3(h: Pick<Heatsink, 'widthMm' | 'lengthMm' | 'heightMm'>): number | null {
  return h.widthMm !== null && h.lengthMm !== null && h.heightMm !== null ? h.widthMm * h.lengthMm * h.heightMm : null;
}

const valueOf = (h: Heatsink, key: Exclude<HeatsinkSortKey, 'name'>): number | null =>
  ({ rth: h.rthKPerW, mass: h.massKg, volume: volumeMm3(h), price: h.price })[key];

/** Filters by search words (name, description, material, notes) and sorts; missing values last. */
export function queryHeatsinks(items: readonly Heatsink[], search: string, sort: SortState<HeatsinkSortKey>): Heatsink[] {
  const found = items.filter((h) => matchesWords([h.name, h.description, h.material, h.notes], search));
  return sortCatalogue(found, sort, valueOf);
}
