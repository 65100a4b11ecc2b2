import type { StudyResult } from '@/core/study';
import { formatDuration, formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import { ResultTable, type ResultColumn } from './result-table';

type SinkRow = { id: string; name?: string; peakC: number; peakTimeS: number; rth?: string; rthNote?: string };

/** The usual burn threshold for touchable metal (PHYSICS.md §7, common practice). */
export const TOUCH_BURN_C = 60;

const COLUMNS: readonly ResultColumn<SinkRow>[] = [
  { label: 'Sink', cell: (s) => ({ text: s.id, note: s.name }) },
  {
    label: 'Peak',
    cell: (s) => ({
      text: formatQuantity(s.peakC, '°C'),
      note: `at ${formatDuration(s.peakTimeS)}${s.peakC > TOUCH_BURN_C ? ', hot enough to burn' : ''}`,
      tone: s.peakC > TOUCH_BURN_C ? 'danger' : 'default',
    }),
  },
  { label: 'Rθsa', cell: (s) => ({ text: s.rth ?? '—', note: s.rthNote }) },
];

/** Sinks (and the enclosure air) with their peaks, for the results. */
export function sinkRows(result: StudyResult): SinkRow[] {
  const rows: SinkRow[] = Object.values(result.sinks).map((s) => ({
    id: s.id,
    name: s.name,
    peakC: s.peakC,
    peakTimeS: s.peakTimeS,
    rth: formatQuantity(s.rthKPerW, 'K/W'),
    rthNote: s.rthRangeKPerW
      ? `${formatNumber(s.rthRangeKPerW[0])}–${formatQuantity(s.rthRangeKPerW[1], 'K/W')} over the run`
      : undefined,
  }));
  if (result.enclosure) rows.push({ id: 'Enclosure air', peakC: result.enclosure.peakC, peakTimeS: result.enclosure.peakTimeS });
  return rows;
}

export type SinkTableProps = { result: StudyResult };

export function SinkTable({ result }: SinkTableProps) {
  return <ResultTable label="Sinks" rows={sinkRows(result)} rowKey={(s) => s.id} columns={COLUMNS} />;
}
