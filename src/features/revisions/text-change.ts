/** Characters of unchanged text kept on each side of an edit. */
const CONTEXT = 24;
/** Longest changed stretch shown before it is cut. */
const MAX_CHANGED = 160;

export type TextExcerpt = { before: string; after: string };

function excerpt(text: string, from: number, to: number): string {
  const start = Math.max(0, from - CONTEXT);
  const changedEnd = Math.min(to, from + MAX_CHANGED);
  const end = changedEnd < to ? changedEnd : Math.min(text.length, to + CONTEXT);
  return `${start > 0 ? '…' : ''}${text.slice(start, end)}${end < text.length ? '…' : ''}`;
}

/**
 * The part of a long text that an edit touched, with a little context on each side, so
 * "…from two equal 24 V adapters…" → "…from two equal external 24 V, 3 A adapters…" reads
 * as the change it is rather than two identical openings.
 */
export function textChangeExcerpt(before: string, after: string): TextExcerpt {
  let head = 0;
  while (head < before.length && head < after.length && before[head] === after[head]) head++;
  let tail = 0;
  while (
    tail < before.length - head &&
    tail < after.length - head &&
    before[before.length - 1 - tail] === after[after.length - 1 - tail]
  ) {
    tail++;
  }
  return {
    before: excerpt(before, head, before.length - tail),
    after: excerpt(after, head, after.length - tail),
  };
}

/** Excerpts of a text change the server's one-line summary cuts short (it keeps about 40 characters of each side). */
export function longTextChange(before: unknown, after: unknown): TextExcerpt | null {
  if (typeof before !== 'string' || typeof after !== 'string' || Math.max(before.length, after.length) <= 40) return null;
  return textChangeExcerpt(before, after);
}
