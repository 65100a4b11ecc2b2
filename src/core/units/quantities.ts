/**
 * Engineering quantities typed by people: "2.5 A", "500mA", "1.2 kW", "35 ms", "0.8 K/W".
 * Values come back in SI units. Prefixes are the SI ones (BIPM, The International System of
 * Units, 9th edition, Table 7) from pico to giga, with centi for lengths; "u" stands in for µ.
 */

const PREFIXES: Record<string, number> = { p: 1e-12, n: 1e-9, u: 1e-6, µ: 1e-6, μ: 1e-6, m: 1e-3, c: 1e-2, '': 1, k: 1e3, M: 1e6, G: 1e9 };

/** A physical unit as accepted in a field: its symbol, aliases, and the factor to SI. */
export type UnitSpec = { symbol: string; aliases?: string[]; toSi?: number; prefixes?: boolean };

export const UNITS = {
  voltage: { symbol: 'V', prefixes: true },
  current: { symbol: 'A', prefixes: true },
  power: { symbol: 'W', prefixes: true },
  time: { symbol: 's', prefixes: true, aliases: ['sec'] },
  resistance: { symbol: 'Ω', aliases: ['ohm', 'Ohm', 'R'], prefixes: true },
  thermalResistance: { symbol: 'K/W', aliases: ['°C/W', 'C/W', 'degC/W'] },
  heatCapacity: { symbol: 'J/K', aliases: ['J/°C', 'J/C'], prefixes: true },
  temperature: { symbol: '°C', aliases: ['C', 'degC'] },
  temperatureDifference: { symbol: 'K', aliases: ['°C', 'C', 'degC'] },
  mass: { symbol: 'g', toSi: 1e-3, prefixes: true },
  length: { symbol: 'm', prefixes: true, aliases: [] },
  speed: { symbol: 'm/s', aliases: ['mps'] },
  capacitance: { symbol: 'F', prefixes: true },
} satisfies Record<string, UnitSpec>;

export type UnitKind = keyof typeof UNITS;

const NUMBER = /^([+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/;

export type ParsedQuantity = { ok: true; value: number } | { ok: false; reason: string };

/**
 * Parses `text` as a quantity of `kind`, answering its SI value, or why not. A bare number is
 * taken in the field's own unit; a comma as decimal separator is accepted when it is the only
 * separator.
 */
export function parseQuantity(text: string, kind: UnitKind): ParsedQuantity {
  const unit: UnitSpec = UNITS[kind];
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, reason: 'is empty' };
  const m = NUMBER.exec(trimmed);
  if (!m) return { ok: false, reason: `"${trimmed}" is not a number` };
  const number = Number(m[1].replace(',', '.'));
  if (!Number.isFinite(number)) return { ok: false, reason: `"${trimmed}" is not a finite number` };
  const suffix = m[2].trim();
  const toSi = unit.toSi ?? 1;
  if (suffix === '') return { ok: true, value: number * toSi };

  const symbols = [unit.symbol, ...(unit.aliases ?? [])];
  for (const symbol of symbols) {
    if (suffix === symbol) return { ok: true, value: number * toSi };
    if (unit.prefixes && suffix.endsWith(symbol)) {
      const prefix = suffix.slice(0, suffix.length - symbol.length);
      if (prefix in PREFIXES) return { ok: true, value: number * PREFIXES[prefix] * toSi };
    }
  }
  return { ok: false, reason: `unit "${suffix}" is not a unit of ${kind.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`)} (use ${unit.symbol})` };
}

/** Formats an SI value with a prefix that keeps 1 ≤ |mantissa| < 1000, to `digits` significant figures. */
export function formatQuantity(value: number, kind: UnitKind, digits = 3): string {
  const unit: UnitSpec = UNITS[kind];
  if (!Number.isFinite(value)) return '—';
  const inUnit = value / (unit.toSi ?? 1);
  if (!unit.prefixes || inUnit === 0) return `${Number(inUnit.toPrecision(digits))} ${unit.symbol}`;
  const order = Math.floor(Math.log10(Math.abs(inUnit)) / 3) * 3;
  const exponent = Math.max(-12, Math.min(9, order));
  const prefix = Object.entries(PREFIXES).find(([p, f]) => f === 10 ** exponent && p !== 'u' && p !== 'μ')?.[0] ?? '';
  return `${Number((inUnit / 10 ** exponent).toPrecision(digits))} ${prefix}${unit.symbol}`;
}
