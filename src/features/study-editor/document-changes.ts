import { at } from './field-path';

const MAX_LINES = 12;

const show = (value: unknown): string => {
  if (value === undefined) return '(none)';
  const text = typeof value === 'string' ? JSON.stringify(value) : JSON.stringify(value) ?? String(value);
  return text.length > 48 ? `${text.slice(0, 47)}…` : text;
};

function isPlain(value: unknown): value is Record<string, unknown> | unknown[] {
  return typeof value === 'object' && value !== null;
}

function diff(before: unknown, after: unknown, path: string, out: string[], limit: number): void {
  if (out.length > limit) return;
  if (isPlain(before) && isPlain(after) && Array.isArray(before) === Array.isArray(after)) {
    const keys = Array.isArray(before)
      ? Array.from({ length: Math.max(before.length, (after as unknown[]).length) }, (_, i) => i)
      : [...new Set([...Object.keys(before), ...Object.keys(after)])];
    for (const key of keys) {
      diff((before as Record<string | number, unknown>)[key], (after as Record<string | number, unknown>)[key], at(path, key), out, limit);
    }
    return;
  }
  if (JSON.stringify(before) !== JSON.stringify(after)) out.push(`${path}: ${show(before)} → ${show(after)}`);
}

/** The edits from `before` to `after` as "path: old → new" lines, like the revision summaries. */
export function changeLines(before: unknown, after: unknown, root = ''): string[] {
  const lines: string[] = [];
  diff(before, after, root, lines, MAX_LINES);
  if (lines.length > MAX_LINES) return [...lines.slice(0, MAX_LINES), 'and more changes'];
  return lines;
}
