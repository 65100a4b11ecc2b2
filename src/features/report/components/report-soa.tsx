import { View } from 'react-native';

import { SoaChart, type SoaChartBoundary } from '@/charts/soa-chart';
import { Text } from '@/components/ui';
import type { DeviceSoaResult, PulseWidth, SoaBoundary, SoaPointResult } from '@/core/study';
import { formatDuration, formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import { ReportPart } from './report-section';
import { ReportTable, type ReportColumn } from './report-table';

const LIMITS = { current: 'current limit', thermal: 'thermal limit', 'second-breakdown': 'second breakdown', voltage: 'voltage limit' } as const;

const pulseText = (pulseS: PulseWidth) => (pulseS === 'dc' ? 'DC' : `${formatDuration(pulseS)} pulse`);
const pulse = (p: SoaPointResult) => pulseText(p.pulseS);

const boundaryOf = (b: SoaBoundary): SoaChartBoundary => ({
  label: `${pulseText(b.condition.pulseS)}, case ${formatQuantity(b.condition.caseC, '°C')}`,
  segments: b.segments,
});

const isWorst = (p: SoaPointResult, worst: SoaPointResult | null) =>
  worst !== null && p.timeS === worst.timeS && p.vceV === worst.vceV && p.icA === worst.icA && p.durationS === worst.durationS;

/** The device's operating points against its SOA at the worst point's pulse width: derated for its case, and at 25 °C. */
function DeviceSoaChart({ soa }: { soa: DeviceSoaResult }) {
  if (!soa.boundaries) return null;
  return (
    <View testID={`report-soa-chart-${soa.device}`}>
      <SoaChart
        boundaries={[boundaryOf(soa.boundaries.atWorstCase), boundaryOf(soa.boundaries.atReference)]}
        points={soa.points.map((p) => ({ vceV: p.vceV, icA: p.icA, worst: isWorst(p, soa.worst), occurrences: p.occurrences }))}
        label={`Safe operating area of ${soa.device} with its operating points`}
        height={280}
      />
    </View>
  );
}

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
        ? `${formatQuantity(s.worst.vceV, 'V')}, ${formatQuantity(s.worst.icA, 'A')}, ${pulse(s.worst)}, case ${formatQuantity(s.worst.caseC, '°C')}, at ${formatDuration(s.worst.timeS)}`
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
  const warnings = checks.flatMap((s) =>
    s.warnings.map((w) => `${s.device}: ${w.message} (${w.stretches} ${w.stretches === 1 ? 'stretch' : 'stretches'}, the first at ${formatDuration(w.firstTimeS)})`),
  );
  return (
    <ReportPart title="Safe operating area">
      <ReportTable label="SOA checks" rows={checks} rowKey={(s) => s.device} columns={COLUMNS} noun={['device', 'devices']} />
      {checks.map((check) => (
        <DeviceSoaChart key={check.device} soa={check} />
      ))}
      {warnings.map((warning) => (
        <Text key={warning} variant="caption">
          {`• ${warning}`}
        </Text>
      ))}
    </ReportPart>
  );
}
