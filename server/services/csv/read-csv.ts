import Papa from 'papaparse';
import { AppError } from '../../errors';

export const MAX_CSV_BYTES = 1024 * 1024;
export const MAX_CSV_ROWS = 5000;

export type CsvTable = {
  headers: string[];
  /** Data rows; `line` is the row's number in the file as a spreadsheet counts it (header = 1). */
  rows: { line: number; cells: string[] }[];
  delimiter: string;
};

const fail = (message: string, details?: { row?: number; column?: string; message: string }[]) =>
  new AppError(400, 'csv_invalid', message, details?.map((d) => ({ ...d, path: d.column ? `row ${d.row}, ${d.column}` : `row ${d.row ?? 1}` })));

/**
 * Decodes an uploaded CSV strictly: UTF-8 only (a BOM is dropped), no binary content, one
 * header row, every row as long as the header. Delimiter: comma, semicolon or tab, detected.
 */
export function readCsv(buffer: Buffer): CsvTable {
  if (buffer.length === 0) throw fail('The file is empty');
  if (buffer.length > MAX_CSV_BYTES) throw fail(`The file is larger than ${MAX_CSV_BYTES / 1024} KiB`);
  if (buffer.includes(0)) throw fail('The file is not text (it contains NUL bytes): upload a CSV file');
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    throw fail('The file is not UTF-8 text: save it as "CSV UTF-8" and upload it again');
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);

  const parsed = Papa.parse<string[]>(text, { delimitersToGuess: [',', ';', '\t'], skipEmptyLines: 'greedy' });
  const quoteError = parsed.errors.find((e) => e.type === 'Quotes');
  if (quoteError) throw fail(`Row ${(quoteError.row ?? 0) + 1}: ${quoteError.message}`, [{ row: (quoteError.row ?? 0) + 1, message: quoteError.message }]);
  const [head, ...body] = parsed.data;
  if (!head || head.every((h) => h.trim() === '')) throw fail('The first row must name the columns');
  const headers = head.map((h) => h.trim());
  const dup = headers.find((h, i) => h !== '' && headers.indexOf(h) !== i);
  if (dup) throw fail(`Column "${dup}" appears twice in the header`);
  if (body.length === 0) throw fail('The file has a header but no rows');
  if (body.length > MAX_CSV_ROWS) throw fail(`The file has ${body.length} rows; at most ${MAX_CSV_ROWS} are imported at once`);

  const ragged = body
    .map((cells, i) => ({ line: i + 2, n: cells.length }))
    .filter((r) => r.n !== headers.length)
    .slice(0, 50)
    .map((r) => ({ row: r.line, message: `has ${r.n} cells but the header has ${headers.length}` }));
  if (ragged.length) throw fail(`${ragged.length} row(s) do not match the header's ${headers.length} columns`, ragged);

  return { headers, rows: body.map((cells, i) => ({ line: i + 2, cells: cells.map((c) => c.trim()) })), delimiter: parsed.meta.delimiter };
}
