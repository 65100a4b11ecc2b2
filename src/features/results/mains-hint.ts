/**
 * Words in a study's own text that say its supply is fed from the mains. The study's own
 * `mainsFed` flag decides; these words only prompt for it when the flag is absent. The text
 * read is the description, the notes, and the rail plan's sources and taps. External adapters
 * do not count: their mains side is not part of the design.
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

export type MainsCaution = { kind: 'fed' } | { kind: 'hint'; word: string };

/**
 * What the mains caution says for a saved document: `fed` when its `mainsFed` flag is true,
 * `hint` (naming the word found) when the flag is absent but the text mentions the mains, and
 * null when the flag is false or nothing points to the mains (PHYSICS.md §7).
 */
export function mainsCaution(raw: unknown): MainsCaution | null {
  if (typeof raw !== 'object' || raw === null) return null;
  const flag = (raw as Record<string, unknown>).mainsFed;
  if (flag === true) return { kind: 'fed' };
  if (flag !== undefined) return null;
  const word = mainsHint(raw);
  return word ? { kind: 'hint', word } : null;
}

/** The sentence for each case; the results and the report show the same words. */
export const MAINS_FED_TEXT = 'This supply is fed from the mains: its mains wiring follows the local electrical codes and is done by qualified people.';
export const mainsHintText = (word: string) =>
  `This study's text mentions ${word}; tick 'Mains-fed' in the study fields if it is. Mains wiring follows the local electrical codes and is done by qualified people.`;
