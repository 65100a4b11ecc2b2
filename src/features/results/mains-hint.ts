/**
 * Words in a study's own text that say its supply is fed from the mains. The study format has
 * no field for it, so the text is read: the description, the notes, and the rail plan's
 * sources and taps. External adapters do not count: their mains side is not part of the design.
 */
const MAINS_WORDS: readonly { pattern: RegExp; word: string }[] = [
  { pattern: /\bmains\b/i, word: 'mains' },
  { pattern: /\btransformers?\b/i, word: 'a transformer' },
  { pattern: /\bline[- ](?:voltage|powered|fed)\b/i, word: 'line voltage' },
  { pattern: /\b(?:100|110|115|120|220|230|240)\s*V\s*(?:AC|a\.c\.|~)/i, word: 'an AC line voltage' },
];

const texts = (value: unknown, keys: readonly string[]): string[] => {
  if (typeof value !== 'object' || value === null) return [];
  const record = value as Record<string, unknown>;
  return keys.map((k) => record[k]).filter((v): v is string => typeof v === 'string');
};

/** What in the saved document points to a mains-fed supply, or null when nothing does. */
export function mainsHint(raw: unknown): string | null {
  if (typeof raw !== 'object' || raw === null) return null;
  const doc = raw as Record<string, unknown>;
  const plan = doc.railPlan as Record<string, unknown> | undefined;
  const parts = [
    ...texts(doc, ['description', 'notes']),
    ...texts(plan, ['notes']),
    ...(Array.isArray(plan?.sources) ? plan.sources.flatMap((s) => texts(s, ['id', 'notes'])) : []),
    ...(Array.isArray(plan?.taps) ? plan.taps.flatMap((t) => texts(t, ['name', 'notes'])) : []),
  ];
  for (const { pattern, word } of MAINS_WORDS) if (parts.some((p) => pattern.test(p))) return word;
  return null;
}
