import type { EstimateNotes, ValidityCheck } from '@/core/heatsink';
import { formatNumber } from '@/features/studies/quantity-format';

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** A dimensionless number as people read it: "0.614", "325", "1.64 × 10⁶", "10⁹". */
export function formatCheckValue(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  const a = Math.abs(v);
  if (a === 0 || (a >= 1e-3 && a < 1e5)) return formatNumber(v);
  const k = Math.floor(Math.log10(a));
  const m = Number((v / 10 ** k).toPrecision(3));
  const power = `10${String(k).replace(/./g, (c) => SUPERSCRIPT[c] ?? c)}`;
  return m === 1 ? power : `${m} × ${power}`;
}

/** "0.1 to 10⁵", "at most 0.1", "at least 1". */
export function checkRange(c: Pick<ValidityCheck, 'min' | 'max'>): string {
  if (c.min !== null && c.max !== null) return `${formatCheckValue(c.min)} to ${formatCheckValue(c.max)}`;
  if (c.min !== null) return `at least ${formatCheckValue(c.min)}`;
  if (c.max !== null) return `at most ${formatCheckValue(c.max)}`;
  return 'any value';
}

/** A check in plain words: "Out of range: boundary layer / half spacing 1.3 (valid at most 1)". */
export const checkSentence = (c: ValidityCheck) => `${c.inRange ? 'In range' : 'Out of range'}: ${c.quantity} ${formatCheckValue(c.value)} (valid ${checkRange(c)})`;

/** Several estimates of one kind (forced air at each speed) as one set of notes, each check naming its case. */
export function mergeNotes(items: readonly { notes: EstimateNotes; label: string }[]): EstimateNotes {
  const validity = items.flatMap(({ notes, label }) => notes.validity.map((c) => ({ ...c, quantity: `${c.quantity} at ${label}` })));
  return { assumptions: [...new Set(items.flatMap((i) => i.notes.assumptions))], validity, withinRange: validity.every((c) => c.inRange) };
}
