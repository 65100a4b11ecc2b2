import { parseQuantity, type UnitKind } from '@/core/units';

/** What a numeric field takes: a quantity with its unit and SI prefixes, or a plain number. */
export type FieldKind = UnitKind | 'number';

export type Read = { ok: true; value: number } | { ok: false; reason: string };

/** Reads a field's text: "2 ms", "500 mA", "0.8 K/W", or a bare number in the field's unit. */
export function readField(text: string, kind: FieldKind): Read {
  if (kind !== 'number') return parseQuantity(text, kind);
  const t = text.trim();
  if (t === '') return { ok: false, reason: 'is empty' };
  const value = Number(t.replace(',', '.'));
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, reason: `"${t}" is not a number` };
}

const PREFIXES: Partial<Record<FieldKind, { factor: number; prefix: string }[]>> = {
  time: [
    { factor: 1, prefix: '' },
    { factor: 1e-3, prefix: 'm' },
    { factor: 1e-6, prefix: 'µ' },
  ],
  current: [
    { factor: 1, prefix: '' },
    { factor: 1e-3, prefix: 'm' },
    { factor: 1e-6, prefix: 'µ' },
  ],
};

const SYMBOL: Partial<Record<FieldKind, string>> = { time: 's', current: 'A' };

/**
 * The text a field shows for a stored value: times and small currents with a prefix ("800 µs",
 * "5 mA"), everything else as a plain number in the field's unit; 12 significant digits, so
 * reading the text back gives the value.
 */
export function fieldText(value: number | null | undefined, kind: FieldKind): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  const clean = (v: number) => String(Number(v.toPrecision(12)));
  const prefixes = PREFIXES[kind];
  if (!prefixes || value === 0 || Math.abs(value) >= 1) return clean(value);
  const p = prefixes.find((q) => Math.abs(value) >= q.factor * (1 - 1e-12)) ?? prefixes[prefixes.length - 1];
  return `${clean(value / p.factor)} ${p.prefix}${SYMBOL[kind]}`;
}
