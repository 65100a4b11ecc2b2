import type { BoundaryTable, PeakRow } from '../core/study';

/** Shortest text that reads back to the same double. */
const num = (v: number): string => String(v);

/**
 * CSV of node temperatures: `time_s`, one `<node>_c` column per watched node and the
 * ambient, and `peak_of` naming the nodes whose peak a row holds (empty on boundary rows).
 * Boundary rows and peak rows are merged in time order; a peak at a boundary time replaces
 * that boundary's row (same instant, the peak value exact).
 */
export function csvFromTable(table: BoundaryTable & { peakRows: PeakRow[] }): string {
  const width = table.columns.length + 1;
  const header = ['time_s', ...table.columns.map((c) => `${c}_c`), 'peak_of'].join(',');
  const peaks: { row: Float64Array; of: string[] }[] = [];
  for (const p of [...table.peakRows].sort((a, b) => a.row[0] - b.row[0])) {
    const same = peaks.find((q) => q.row[0] === p.row[0]);
    if (same) {
      same.of.push(p.node);
      const c = 1 + table.columns.indexOf(p.node);
      same.row[c] = p.row[c];
    } else peaks.push({ row: Float64Array.from(p.row), of: [p.node] });
  }
  const lines = [header];
  const line = (values: ArrayLike<number>, of: string[]) => lines.push([...Array.from(values, num), of.join(' ')].join(','));
  let next = 0;
  for (let r = 0; r < table.rows; r++) {
    const row = table.values.subarray(r * width, (r + 1) * width);
    while (next < peaks.length && peaks[next].row[0] < row[0]) line(peaks[next].row, peaks[next++].of);
    if (next < peaks.length && peaks[next].row[0] === row[0]) line(peaks[next].row, peaks[next++].of);
    else line(row, []);
  }
  while (next < peaks.length) line(peaks[next].row, peaks[next++].of);
  return `${lines.join('\n')}\n`;
}
