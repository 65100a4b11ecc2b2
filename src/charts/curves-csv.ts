import { valueAt } from './series-sample';
import type { Series } from '@/core/study';

/**
 * The chart curves as CSV: `time_s`, then one `<series>_c` column per series (named as in the
 * study format, `Q1.junction_c`). Rows are the union of every series' own times; a series is
 * exact at its own points and straight-line between them elsewhere, as the chart draws it.
 * Ids are letters, digits, `_` and `-` only (study format), so no field needs quoting.
 */
export function curvesCsv(series: Record<string, Series>): string {
  const keys = Object.keys(series);
  const times = [...new Set(keys.flatMap((k) => series[k].timeS))].sort((a, b) => a - b);
  const lines = [['time_s', ...keys.map((k) => `${k}_c`)].join(',')];
  for (const t of times) {
    const values = keys.map((k) => {
      const v = valueAt(series[k], t);
      return Number.isNaN(v) ? '' : String(v);
    });
    lines.push([String(t), ...values].join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** A study title as a file-name stem: "Bench load, two MOSFETs" → "bench-load-two-mosfets". */
export function titleSlug(title: string): string {
  const slug = title
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .slice(0, 60)
    .replace(/^-+|-+$/g, '');
  return slug || 'study';
}

/** A file name from the study title: "bench-load-curves.csv". */
export function curvesFileName(title: string): string {
  return `${titleSlug(title)}-curves.csv`;
}
