/** Edits of one list in the document (segments, points, devices); each returns a new array. */

export function moveItem<T>(list: readonly T[], index: number, by: -1 | 1): T[] {
  const to = index + by;
  if (to < 0 || to >= list.length) return [...list];
  const next = [...list];
  [next[index], next[to]] = [next[to], next[index]];
  return next;
}

/** A deep copy of the item, placed right after it. */
export function duplicateItem<T>(list: readonly T[], index: number): T[] {
  const next = [...list];
  next.splice(index + 1, 0, JSON.parse(JSON.stringify(list[index])) as T);
  return next;
}

export function removeItem<T>(list: readonly T[], index: number): T[] {
  return list.filter((_, i) => i !== index);
}

/** The first id of the form `${prefix}${n}` not in `taken` (Q2, S3). */
export function nextId(prefix: string, taken: readonly (string | undefined)[]): string {
  for (let n = 1; ; n++) {
    const id = `${prefix}${n}`;
    if (!taken.includes(id)) return id;
  }
}
