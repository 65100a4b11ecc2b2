/** One top-level entry of a study document, described for a read-only summary. */
export type OutlineEntry = { key: string; label: string; detail: string };

export type DocumentOutline = {
  /** The document's own format version, when it declares one. */
  formatVersion: string | null;
  entries: OutlineEntry[];
};

const VERSION_KEYS = ['formatVersion', 'format_version', 'schemaVersion', 'version'];
const MAX_TEXT = 80;

/** "loadProfile" / "load_profile" → "Load profile". */
export function humanizeKey(key: string): string {
  const words = key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[_-]+/g, ' ')
    .trim()
    .toLowerCase();
  return words ? words[0].toUpperCase() + words.slice(1) : key;
}

function describe(value: unknown): string {
  if (value === null || value === undefined) return 'not set';
  if (Array.isArray(value)) return value.length === 1 ? '1 entry' : `${value.length} entries`;
  if (typeof value === 'object') {
    const count = Object.keys(value).length;
    return count === 1 ? '1 field' : `${count} fields`;
  }
  const text = String(value);
  return text.length > MAX_TEXT ? `${text.slice(0, MAX_TEXT - 1)}…` : text;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Summarises whatever the study document holds without assuming its schema,
 * so the view stays truthful as the document format grows.
 */
export function outlineDocument(document: unknown): DocumentOutline {
  if (!isRecord(document)) return { formatVersion: null, entries: [] };
  const versionKey = VERSION_KEYS.find((key) => key in document && document[key] !== null);
  const entries = Object.entries(document)
    .filter(([key]) => key !== versionKey)
    .map(([key, value]) => ({ key, label: humanizeKey(key), detail: describe(value) }));
  return { formatVersion: versionKey ? String(document[versionKey]) : null, entries };
}
