import type { SortState } from './components/sort-chips';

const collator = new Intl.Collator('en', { sensitivity: 'base', numeric: true });

/** Words that must all appear somewhere in the given texts (case-insensitive). */
export function matchesWords(texts: readonly (string | null | undefined)[], search: string): boolean {
  const words = search.trim().toLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0) return true;
  const haystack = texts.filter(Boolean).join(' ').toLowerCase();
  return words.every((w) => haystack.includes(w));
}

/**
 * Sorts by name, or by a numeric key with entries that lack it last in either direction (ties
 * keep name order).
 */
export function sortCatalogue<T extends { name: string }, K extends string>(
  items: readonly T[],
  sort: SortState<K | 'name'>,
  valueOf: (item: T, key: K) => number | null,
): T[] {
  const sign = sort.direction === 'asc' ? 1 : -1;
  const key = sort.key;
  if (key === 'name') return [...items].sort((a, b) => sign * collator.compare(a.name, b.name));
  return [...items].sort((a, b) => {
    const va = valueOf(a, key as K);
    const vb = valueOf(b, key as K);
    if (va === null && vb === null) return collator.compare(a.name, b.name);
    if (va === null) return 1;
    if (vb === null) return -1;
    return sign * (va - vb) || collator.compare(a.name, b.name);
  });
}
