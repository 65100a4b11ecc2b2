import { Text } from '@/components/ui';
import type { DeviceSoaResult, SoaPointResult } from '@/core/study';
import { formatEventTime } from '@/features/results/event-text';
import { formatDuration, formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import { ReportPart } from './report-section';
import { ReportTable, type ReportColumn } from './report-table';

const LIMITS = { current: 'current limit', thermal: 'thermal limit', 'second-breakdown': 'second breakdown', voltage: 'voltage limit' } as const;

const pulse = (p: SoaPointResult) => (p.pulseS === 'dc' ? 'DC' : `${formatDuration(p.pulseS)} pulse`);

const COLUMNS: readonly ReportColumn<DeviceSoaResult>[] = [
  { label: 'Device', cell: (s) => `${s.device} (${s.transistor})`, flex: 1 },
  {
    label: 'Check',
    cell: (s) =>
      s.worst === null
        ? 'no operating point carries current'
        : s.passed
          ? `passes: all ${s.distinctPoints} points inside`
          : `fails: ${s.failedPoints} of ${s.distinctPoints} points outside`,
    flex: 1.5,
  },
  {
    label: 'Worst point',
    cell: (s) =>
      s.worst
        ? `${formatQuantity(s.worst.vceV, 'V')}, ${formatQuantity(s.worst.icA, 'A')}, ${pulse(s.worst)}, case ${formatQuantity(s.worst.caseC, '°C')}, at ${formatEventTime(s.worst.timeS)}`
        : '—',
    flex: 2.4,
  },
  {
    label: 'Allowed',
    cell: (s) => (s.worst ? `${formatQuantity(s.worst.allowedA, 'A')} (margin ×${formatNumber(s.worst.margin)}), ${LIMITS[s.worst.limit]}` : '—'),
    flex: 1.8,
  },
];

export type ReportSoaProps = { soa: Record<string, DeviceSoaResult> };

/** Each device's SOA check: whether every operating point lies inside, and the worst one (PHYSICS.md §4). */
export function ReportSoa({ soa }: ReportSoaProps) {
  const checks = Object.values(soa);
  const warnings = checks.flatMap((s) => s.warnings.map((w) => `${s.device}: ${w.message}`));
  return (
    <ReportPart title="Safe operating area">
      <ReportTable label="SOA checks" rows={checks} rowKey={(s) => s.device} columns={COLUMNS} noun={['device', 'devices']} />
      {warnings.map((warning) => (
        <Text key={warning} variant="caption">
          {`• ${warning}`}
        </Text>
      ))}
    </ReportPart>
  );
}
