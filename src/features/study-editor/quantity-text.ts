import { parseQuantity, UNITS, type UnitKind, type UnitSpec } from '@/core/units';

/** What a numeric field takes: a physical quantity, a plain number, or a whole number. */
export type FieldKind = UnitKind | 'number' | 'integer';

export type ReadResult = { ok: true; value: number } | { ok: false; reason: string };

/** The unit a bare number is read in, for the field's label ("" for plain numbers). */
export function unitOf(kind: FieldKind): string {
  if (kind === 'number' || kind === 'integer') return '';
  // Mass is the one unit whose SI form carries a prefix.
  return kind === 'mass' ? 'kg' : UNITS[kind].symbol;
}

/** Reads a field's text: quantities with units and SI prefixes ("500 mA"), numbers as typed. */
export function readText(text: string, kind: FieldKind): ReadResult {
  if (kind !== 'number' && kind !== 'integer') {
    // Mass is typed in grams or kilograms; a bare number means kilograms, the document's unit.
    if (kind === 'mass' && /^\s*[+-]?[\d.,]+(?:[eE][+-]?\d+)?\s*$/.test(text)) return parseQuantity(`${text} kg`, kind);
    return parseQuantity(text, kind);
  }
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, reason: 'is empty' };
  const value = Number(trimmed.replace(',', '.'));
  if (!Number.isFinite(value)) return { ok: false, reason: `"${trimmed}" is not a number` };
  if (kind === 'integer' && !Number.isInteger(value)) return { ok: false, reason: `must be a whole number, got ${trimmed}` };
  return { ok: true, value };
}

const PREFIX_BY_EXPONENT: Record<number, string> = { [-12]: 'p', [-9]: 'n', [-6]: 'µ', [-3]: 'm', 0: '', 3: 'k', 6: 'M', 9: 'G' };

/** Kinds shown without a prefix above one: 3600 s reads better than 3.6 ks. */
const NO_LARGE_PREFIX: readonly FieldKind[] = ['time', 'heatCapacity', 'resistance'];

/**
 * The text a field shows for an SI value: a prefix that keeps the mantissa between 1 and
 * 1000 and every significant digit (12), so reading the text back gives the value.
 */
export function editText(value: number, kind: FieldKind): string {
  if (kind === 'number' || kind === 'integer') return String(Number(value.toPrecision(12)));
  // The document and the field's label are in kilograms.
  if (kind === 'mass') return `${Number(value.toPrecision(12))} kg`;
  const unit: UnitSpec = UNITS[kind];
  const inUnit = value / (unit.toSi ?? 1);
  if (!unit.prefixes || inUnit === 0) return `${Number(inUnit.toPrecision(12))} ${unit.symbol}`;
  let exponent = Math.floor(Math.log10(Math.abs(inUnit)) / 3) * 3;
  exponent = Math.max(-12, Math.min(NO_LARGE_PREFIX.includes(kind) ? 0 : 9, exponent));
  return `${Number((inUnit / 10 ** exponent).toPrecision(12))} ${PREFIX_BY_EXPONENT[exponent]}${unit.symbol}`;
}
