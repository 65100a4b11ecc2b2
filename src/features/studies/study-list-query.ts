import type { StudyStatus, StudySummary } from './types';
import { STATUS_LABELS, STATUS_ORDER } from './status';

export type SortKey = 'title' | 'status' | 'author' | 'updated';
export type SortDirection = 'asc' | 'desc';
export type StudySort = { key: SortKey; direction: SortDirection };
export type StatusFilter = StudyStatus | 'all';

export const DEFAULT_SORT: StudySort = { key: 'updated', direction: 'desc' };

const collator = new Intl.Collator('en', { sensitivity: 'base', numeric: true });

const comparators: Record<SortKey, (a: StudySummary, b: StudySummary) => number> = {
  title: (a, b) => collator.compare(a.title, b.title),
  status: (a, b) => STATUS_ORDER[a.status] - STATUS_ORDER[b.status],
  author: (a, b) => collator.compare(a.author.name, b.author.name),
  updated: (a, b) => Date.parse(a.updatedAt) - Date.parse(b.updatedAt),
};

function matchesSearch(study: StudySummary, needle: string): boolean {
  if (!needle) return true;
  const haystack = [study.title, study.description, study.author.name, study.teamName, STATUS_LABELS[study.status]]
    .join(' ')
    .toLowerCase();
  return needle
    .split(/\s+/)
    .filter(Boolean)
    .every((word) => haystack.includes(word));
}

/** Filters by status and search words (all must match), then sorts; ties keep the newest first. */
export function queryStudies(
  studies: readonly StudySummary[],
  search: string,
  status: StatusFilter,
  sort: StudySort,
): StudySummary[] {
  const needle = search.trim().toLowerCase();
  const sign = sort.direction === 'asc' ? 1 : -1;
  return studies
    .filter((study) => (status === 'all' || study.status === status) && matchesSearch(study, needle))
    .sort((a, b) => sign * comparators[sort.key](a, b) || comparators.updated(b, a));
}

/** Clicking the active column flips its direction; a new column starts in its natural order. */
export function nextSort(current: StudySort, key: SortKey): StudySort {
  if (current.key === key) return { key, direction: current.direction === 'asc' ? 'desc' : 'asc' };
  return { key, direction: key === 'updated' ? 'desc' : 'asc' };
}
