import { Text } from '@/components/ui';
import type { BestThreshold, RailPlanResult, TapWorstCase } from '@/core/study';
import { FactGrid } from '@/features/studies/components/fact-grid';
import type { Fact } from '@/features/studies/document-facts';
import { formatQuantity } from '@/features/studies/quantity-format';

import { railWarningText } from '../result-warnings';
import { ReportPart } from './report-section';
import { ReportTable, type ReportColumn } from './report-table';

type TapRow = RailPlanResult['taps'][number] & { index: number; worst: TapWorstCase | null };

const worstText = (w: TapWorstCase | null) =>
  w ? `${formatQuantity(w.powerW, 'W')} at ${formatQuantity(w.voutV, 'V')} out, ${formatQuantity(w.currentA, 'A')}, ${formatQuantity(w.vinV, 'V')} in` : 'serves no output';

const TAP_COLUMNS: readonly ReportColumn<TapRow>[] = [
  { label: 'Tap', cell: (t) => `${t.index + 1}. ${t.name}`, flex: 1.6 },
  { label: 'Open circuit', cell: (t) => formatQuantity(t.openCircuitV, 'V'), flex: 0.9 },
  { label: 'Capability', cell: (t) => `${formatQuantity(t.capabilityA, 'A')}, set by ${t.limitedBy}`, flex: 1.3 },
  { label: 'Worst dissipation', cell: (t) => worstText(t.worst), flex: 2.2 },
];

const THRESHOLD_COLUMNS: readonly ReportColumn<BestThreshold>[] = [
  { label: 'Threshold', cell: (t) => `tap ${t.index + 1} → ${t.index + 2}` },
  { label: 'Given', cell: (t) => formatQuantity(t.givenV, 'V') },
  { label: 'Best', cell: (t) => formatQuantity(t.bestV, 'V') },
  { label: 'Headroom at full current', cell: (t) => (t.safe ? 'kept' : `lost above ${formatQuantity(t.fullCurrentA, 'A')}`) },
];

function summaryFacts(rail: RailPlanResult): Fact[] {
  const facts: Fact[] = [
    { label: 'Worst case, thresholds given', value: worstText(rail.worst.overall) },
    { label: 'Worst case, best thresholds', value: worstText(rail.worstWithBest.overall) },
    { label: 'Tap changes in the run', value: String(rail.selection.changes) },
  ];
  const required = rail.requiredRsa;
  if (required) {
    const rsa = (v: number | null) => (v === null ? 'any' : formatQuantity(v, 'K/W'));
    facts.push({
      label: 'Required Rθsa (given / best)',
      value: `${rsa(required.givenKPerW)} / ${rsa(required.bestKPerW)} at ${formatQuantity(required.ambientC, '°C')}, Tj ${formatQuantity(required.tjTargetC, '°C')}`,
    });
  }
  if (rail.chatter) {
    facts.push({
      label: 'Relay droop',
      value: `${formatQuantity(rail.chatter.droopV, 'V')} against ${formatQuantity(rail.chatter.hysteresisV, 'V')} hysteresis: ${rail.chatter.chatters ? 'may chatter' : 'no chatter'}`,
    });
  }
  return facts;
}

export type ReportRailPlanProps = { rail: RailPlanResult };

/** The rail plan's taps, thresholds (given and best), worst dissipation and the Rθsa it needs (PHYSICS.md §2, §5). */
export function ReportRailPlan({ rail }: ReportRailPlanProps) {
  const taps = rail.taps.map((tap, index) => ({ ...tap, index, worst: rail.worst.taps[index] ?? null }));
  return (
    <ReportPart title="Rail plan">
      <FactGrid facts={summaryFacts(rail)} />
      <ReportTable label="Taps" rows={taps} rowKey={(t) => String(t.index)} columns={TAP_COLUMNS} noun={['tap', 'taps']} />
      {rail.thresholds.length > 0 ? (
        <ReportTable label="Thresholds" rows={rail.thresholds} rowKey={(t) => String(t.index)} columns={THRESHOLD_COLUMNS} noun={['threshold', 'thresholds']} />
      ) : null}
      {rail.warnings.map((warning) => (
        <Text key={warning} variant="caption">
          {`• ${railWarningText(warning)}`}
        </Text>
      ))}
    </ReportPart>
  );
}
