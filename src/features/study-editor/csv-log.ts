import Papa from 'papaparse';

import { parseQuantity, type UnitKind } from '@/core/units';

/** A logged table pasted or picked as CSV: column names and the data rows. */
export type LogTable = { columns: string[]; rows: { line: number; cells: string[] }[]; hasHeader: boolean };

export type ReadLog = { ok: true; table: LogTable } | { ok: false; reason: string };

/** Refused beyond this many rows: a segment each would swamp the table and the solver. */
export const MAX_LOG_ROWS = 20000;

const NUMBER_START = /^\s*[+-]?(?:\d|[.,]\d)/;

/** Reads CSV text (comma, semicolon or tab); a first row that is not all numbers names the columns. */
export function readLog(text: string): ReadLog {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return { ok: false, reason: 'Paste or pick a CSV file first.' };
  const parsed = Papa.parse<string[]>(body, { delimitersToGuess: [',', ';', '\t'], skipEmptyLines: 'greedy' });
  const quotes = parsed.errors.find((e) => e.type === 'Quotes');
  if (quotes) return { ok: false, reason: `Line ${(quotes.row ?? 0) + 1}: ${quotes.message}` };
  const data = parsed.data.map((row) => row.map((cell) => cell.trim()));
  if (data.length === 0) return { ok: false, reason: 'The CSV holds no rows.' };
  const hasHeader = !data[0].every((cell) => NUMBER_START.test(cell));
  const width = data[0].length;
  const columns = hasHeader ? data[0].map((c, i) => c || `Column ${i + 1}`) : data[0].map((_, i) => `Column ${i + 1}`);
  const first = hasHeader ? 1 : 0;
  const rows = data.slice(first).map((cells, i) => ({ line: i + first + 1, cells }));
  const ragged = rows.find((r) => r.cells.length !== width);
  if (ragged) return { ok: false, reason: `Line ${ragged.line} has ${ragged.cells.length} cells, the first row ${width}.` };
  if (rows.length < 2) return { ok: false, reason: 'At least two data rows are needed: each row lasts until the next row’s time.' };
  if (rows.length > MAX_LOG_ROWS) return { ok: false, reason: `The log has ${rows.length} rows; at most ${MAX_LOG_ROWS} are taken. Thin it out first.` };
  return { ok: true, table: { columns, rows, hasHeader } };
}

/** Where a value comes from: a column (bare numbers in `unit`), or one value for every row. */
export type ValueSource = { column: number; unit: string } | { value: number };

export type LogMapping =
  | { kind: 'electrical'; time: { column: number; unit: string }; iload: ValueSource; vout: ValueSource; vin: ValueSource | null }
  | { kind: 'power'; time: { column: number; unit: string }; power: ValueSource; device: string };

export type LogSegment = { durationS: number; powerW?: Record<string, number>; vinV?: number; voutV?: number; iloadA?: number };

export type LogError = { line: number; column: string; reason: string };

export type LogResult = { ok: true; segments: LogSegment[] } | { ok: false; errors: LogError[] };

const MAX_ERRORS = 5;

/** Reads one cell: "12.5" in the column's unit, or a value with its own unit ("250 mA"). */
export function readCell(cell: string, unit: string, kind: UnitKind) {
  const hasUnit = /[^\d\s.,eE+-]/.test(cell);
  return parseQuantity(hasUnit || unit === '' ? cell : `${cell} ${unit}`, kind);
}

/** The unit text is one the field's kind takes ("ms" for time, "mA" for current). */
export function checkUnit(unit: string, kind: UnitKind): string | null {
  if (unit.trim() === '') return null;
  const probe = parseQuantity(`1 ${unit}`, kind);
  return probe.ok ? null : probe.reason.replace(/^unit /, 'Unit ');
}

/**
 * Turns logged rows into segments: each row holds from its time until the next row's time,
 * so the last row only marks the end. With `merge`, neighbouring rows of equal values make
 * one segment. Times must increase strictly; the profile starts at the first row.
 */
export function logSegments(table: LogTable, mapping: LogMapping, merge: boolean): LogResult {
  const errors: LogError[] = [];
  const fail = (line: number, column: number, reason: string) => {
    if (errors.length < MAX_ERRORS) errors.push({ line, column: table.columns[column] ?? `column ${column + 1}`, reason });
  };
  const value = (row: LogTable['rows'][number], source: ValueSource, kind: UnitKind): number => {
    if ('value' in source) return source.value;
    const read = readCell(row.cells[source.column] ?? '', source.unit, kind);
    if (read.ok) return read.value;
    fail(row.line, source.column, read.reason);
    return NaN;
  };
  const times = table.rows.map((row) => value(row, mapping.time, 'time'));
  for (let i = 1; i < times.length; i++) {
    if (times[i] <= times[i - 1]) fail(table.rows[i].line, mapping.time.column, `time must be after the previous row’s (${times[i - 1]} s)`);
  }
  const segments: LogSegment[] = [];
  for (let i = 0; i < table.rows.length - 1; i++) {
    const row = table.rows[i];
    const durationS = Number((times[i + 1] - times[i]).toPrecision(12));
    let segment: LogSegment;
    if (mapping.kind === 'power') {
      segment = { durationS, powerW: { [mapping.device]: value(row, mapping.power, 'power') } };
    } else {
      segment = { durationS };
      if (mapping.vin) segment.vinV = value(row, mapping.vin, 'voltage');
      segment.voutV = value(row, mapping.vout, 'voltage');
      segment.iloadA = value(row, mapping.iload, 'current');
    }
    const last = segments[segments.length - 1];
    if (merge && last && sameLevels(last, segment)) last.durationS = Number((last.durationS + durationS).toPrecision(12));
    else segments.push(segment);
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, segments };
}

function sameLevels(a: LogSegment, b: LogSegment): boolean {
  return a.vinV === b.vinV && a.voutV === b.voutV && a.iloadA === b.iloadA && JSON.stringify(a.powerW) === JSON.stringify(b.powerW);
}

const HEADER_UNIT = /[([]\s*([^)\]]+?)\s*[)\]]\s*$/;
const SUFFIX_UNITS: Record<string, string> = { s: 's', ms: 'ms', us: 'µs', a: 'A', ma: 'mA', v: 'V', mv: 'mV', w: 'W', mw: 'mW', kw: 'kW' };

/** The unit a column's name states ("I (mA)", "time_ms"), if the kind takes it; else the SI symbol. */
export function unitFromHeader(header: string, kind: UnitKind, fallback: string): string {
  const bracket = HEADER_UNIT.exec(header)?.[1];
  const suffix = /_([a-z]+)$/i.exec(header)?.[1]?.toLowerCase();
  const guess = bracket ?? (suffix ? SUFFIX_UNITS[suffix] : undefined);
  return guess && checkUnit(guess, kind) === null ? guess : fallback;
}

export type ColumnRole = 'time' | 'current' | 'vin' | 'vout' | 'voltage' | 'power';

const ROLE_PATTERNS: Record<ColumnRole, RegExp> = {
  time: /time|^t(\b|_)|sec/i,
  current: /curr|amp|iload|^i(\b|_)/i,
  vin: /vin|v_in|input|supply/i,
  vout: /vout|v_out|output/i,
  voltage: /volt|^v(\b|_)|^u(\b|_)/i,
  power: /pow|watt|^p(\b|_)/i,
};

/** The first column whose name suggests the role, or -1. */
export function guessColumn(columns: readonly string[], role: ColumnRole): number {
  return columns.findIndex((c) => ROLE_PATTERNS[role].test(c));
}
