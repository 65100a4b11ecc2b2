import { readFileSync, writeFileSync } from 'node:fs';
import { evaluateStudy, parseStudy, type StudyDocument, type StudyResult } from '../core/study';
import { csvFromTable } from './csv-table';

/** Solved boundaries kept for --csv: every boundary of a 100,000-segment profile plus its event and chart cuts. */
const CSV_MAX_ROWS = 400_000;

const USAGE = 'usage: npm run solve -- STUDY.json [--csv OUT.csv] [--series]  (--series adds chart data: series, rail-plan map, SOA boundaries)';

export type Io = { stdout: (text: string) => void; stderr: (text: string) => void };

const defaultIo: Io = {
  stdout: (t) => process.stdout.write(t),
  stderr: (t) => process.stderr.write(t),
};

type Args = { file: string; csv?: string; series: boolean };

function parseArgs(argv: string[]): Args | string {
  let file: string | undefined;
  let csv: string | undefined;
  let series = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--csv') {
      csv = argv[++i];
      if (!csv) return '--csv needs a file name';
    } else if (a === '--series') series = true;
    else if (a.startsWith('-')) return `unknown option ${a}`;
    else if (file) return `one study file at a time (got ${file} and ${a})`;
    else file = a;
  }
  return file ? { file, csv, series } : 'no study file given';
}

/**
 * Result JSON for printing: the CSV table stays out, and chart data (series, the rail plan's
 * map grid, SOA boundary curves) unless asked for; the SOA checks and rail-plan summary stay.
 */
function printable(result: StudyResult, series: boolean): object {
  const { table: _table, series: chart, ...rest } = result;
  if (series) return chart ? { ...rest, series: chart } : rest;
  const soa = Object.fromEntries(Object.entries(rest.soa).map(([id, { boundaries: _b, ...check }]) => [id, check]));
  const summary: Record<string, unknown> = { ...rest, soa };
  if (rest.railPlan) {
    const { map: _map, ...plan } = rest.railPlan;
    summary.railPlan = plan;
  }
  return summary;
}

/**
 * Solves a study file and prints the result as JSON; `--csv OUT` also writes node
 * temperatures at every solved boundary and at each peak. Returns the exit code: 0 on
 * success, 2 for a file that cannot be read, parsed or solved (one line on stderr naming
 * the file, the field and the reason).
 */
export function main(argv: string[], io: Io = defaultIo): number {
  const args = parseArgs(argv);
  if (typeof args === 'string') {
    io.stderr(`${args}\n${USAGE}\n`);
    return 2;
  }
  const fail = (reason: string) => {
    io.stderr(`${args.file}: ${reason.split('\n')[0]}\n`);
    return 2;
  };
  let text: string;
  try {
    text = readFileSync(args.file, 'utf8');
  } catch (e) {
    return fail(`cannot read the file (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    return fail(`not valid JSON (${(e as Error).message})`);
  }
  let doc: StudyDocument;
  try {
    doc = parseStudy(json);
  } catch (e) {
    if (e instanceof RangeError || e instanceof TypeError) return fail(e.message);
    throw e;
  }
  let result: StudyResult;
  try {
    result = evaluateStudy(doc, { boundaryRows: args.csv ? CSV_MAX_ROWS : 0, seriesPoints: args.series ? undefined : 0 });
  } catch (e) {
    // A valid file can still ask for the unsolvable (a network too stiff, shutdown cycling without end).
    if (e instanceof RangeError) return fail(e.message);
    throw e;
  }
  if (args.csv && result.table) {
    try {
      writeFileSync(args.csv, csvFromTable(result.table));
    } catch (e) {
      io.stderr(`${args.csv}: cannot write the CSV (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})\n`);
      return 1;
    }
    if (result.table.dropped > 0) {
      io.stderr(`${args.csv}: holds the first ${result.table.rows} boundaries of ${result.table.rows + result.table.dropped}, and every peak\n`);
    }
  }
  io.stdout(`${JSON.stringify(printable(result, args.series), null, 2)}\n`);
  return 0;
}

if (require.main === module) process.exitCode = main(process.argv.slice(2));
