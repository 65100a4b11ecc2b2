/** One field that differs between two JSON documents, by its path (`devices[1].tjMaxC`). */
export type FieldChange =
  | { kind: 'changed'; path: string; before: unknown; after: unknown }
  | { kind: 'added'; path: string; after: unknown }
  | { kind: 'removed'; path: string; before: unknown };

type Json = unknown;

const isObject = (v: Json): v is Record<string, Json> => typeof v === 'object' && v !== null && !Array.isArray(v);

function join(path: string, key: string | number): string {
  if (typeof key === 'number') return `${path}[${key}]`;
  return /^[A-Za-z_$][\w$]*$/.test(key) ? (path ? `${path}.${key}` : key) : `${path}[${JSON.stringify(key)}]`;
}

function walk(before: Json, after: Json, path: string, out: FieldChange[], limit: number) {
  if (out.length >= limit) return;
  if (Array.isArray(before) && Array.isArray(after)) {
    const n = Math.max(before.length, after.length);
    for (let i = 0; i < n && out.length < limit; i++) {
      if (i >= before.length) out.push({ kind: 'added', path: join(path, i), after: after[i] });
      else if (i >= after.length) out.push({ kind: 'removed', path: join(path, i), before: before[i] });
      else walk(before[i], after[i], join(path, i), out, limit);
    }
    return;
  }
  if (isObject(before) && isObject(after)) {
    const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
    for (const key of [...keys].sort()) {
      if (out.length >= limit) return;
      if (!(key in before)) out.push({ kind: 'added', path: join(path, key), after: after[key] });
      else if (!(key in after)) out.push({ kind: 'removed', path: join(path, key), before: before[key] });
      else walk(before[key], after[key], join(path, key), out, limit);
    }
    return;
  }
  if (!Object.is(before, after)) out.push({ kind: 'changed', path: path || '(document)', before, after });
}

/**
 * Field-by-field differences between two JSON documents, in a stable order, at most `limit`.
 * Arrays compare by index, so inserting a segment shows as changes after it plus one addition.
 */
export function diffDocuments(before: Json, after: Json, limit = 500): FieldChange[] {
  const out: FieldChange[] = [];
  walk(before ?? null, after ?? null, '', out, limit);
  return out;
}

function show(value: Json): string {
  if (isObject(value)) return '{…}';
  if (Array.isArray(value)) return `[${value.length} items]`;
  const s = JSON.stringify(value);
  return s.length > 40 ? `${s.slice(0, 37)}…` : s;
}

/** Two long texts shown around where they first differ, so an edit near the end is visible. */
function showTexts(before: string, after: string): [string, string] {
  if (before.length <= 40 && after.length <= 40) return [JSON.stringify(before), JSON.stringify(after)];
  let start = 0;
  while (start < before.length && start < after.length && before[start] === after[start]) start++;
  const from = Math.max(0, start - 12);
  const cut = (t: string) => `"${from > 0 ? '…' : ''}${t.slice(from, from + 32)}${t.length > from + 32 ? '…' : ''}"`;
  return [cut(before), cut(after)];
}

/** One line per change, for people: `devices[0].tjMaxC: 150 → 175`. */
export function describeChanges(changes: FieldChange[]): string[] {
  return changes.map((c) =>
    c.kind === 'changed'
      ? typeof c.before === 'string' && typeof c.after === 'string'
        ? `${c.path}: ${showTexts(c.before, c.after).join(' → ')}`
        : `${c.path}: ${show(c.before)} → ${show(c.after)}`
      : c.kind === 'added'
        ? `${c.path}: added ${show(c.after)}`
        : `${c.path}: removed (was ${show(c.before)})`,
  );
}
