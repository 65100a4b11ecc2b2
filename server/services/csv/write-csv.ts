import Papa from 'papaparse';

/**
 * A cell that a spreadsheet would run as a formula (=, +, -, @, tab, CR first) is prefixed
 * with an apostrophe so it stays text (OWASP, "CSV Injection"). Numbers are written as numbers.
 */
export function safeCell(value: unknown): string | number {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? value : '';
  const s = String(value);
  return /^[=+\-@\t\r]/.test(s) ? `'${s}` : s;
}

export function writeCsv(headers: string[], rows: unknown[][]): string {
  return Papa.unparse({ fields: headers, data: rows.map((r) => r.map(safeCell)) }, { newline: '\r\n' });
}
