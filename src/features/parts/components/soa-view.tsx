import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { InlineAlert, Text, useIsWide } from '@/components/ui';
import { partSoaChart } from '@/charts/soa-boundaries';
import { SoaChart } from '@/charts/soa-chart';
import { spacing } from '@/constants/theme';
import { FactGrid } from '@/features/studies/components/fact-grid';
import type { Fact } from '@/features/studies/document-facts';
import { formatQuantity } from '@/features/studies/quantity-format';

import { formatPercent, formatPulse, formatTime, KIND_LABEL } from '../part-format';
import type { DeratingJson, SoaJson } from '../types';
import { ValueTable } from './value-table';

const deratingText = (d: DeratingJson) =>
  d.kind === 'linear' ? `${formatPercent(d.fractionPerK)} per K above 25\u00a0°C` : `${d.points.length} points from ${formatQuantity(d.points[0]?.caseC ?? 25, '°C')}`;

function linearModeText(soa: SoaJson): string {
  if (!soa.linearMode) return 'No linear-mode rating';
  if (soa.linearMode.dcRated) return 'DC SOA rated in linear mode';
  const longest = soa.linearMode.longestRatedPulseS;
  return `DC not rated in linear mode${longest ? `; pulses rated up to ${formatTime(longest)}` : ''}`;
}

function soaFacts(soa: SoaJson): Fact[] {
  const facts: Fact[] = [
    { label: 'Given as', value: soa.kind === 'parameters' ? 'Parameters' : `Datasheet curves (${soa.curves.length})` },
    { label: 'Transistor', value: KIND_LABEL[soa.transistor] },
    { label: 'Tj,max of the thermal line', value: formatQuantity(soa.tjMaxC, '°C') },
    { label: 'Zθjc for pulses', value: soa.zthJc ? `${soa.zthJc.length} Foster terms` : soa.kind === 'parameters' ? 'None: pulses count as DC' : 'From the curves' },
  ];
  if (soa.kind === 'parameters') {
    facts.push(
      { label: 'Ic,max', value: formatQuantity(soa.icMaxA, 'A') },
      { label: 'Peak pulse current', value: soa.icPulseMaxA ? formatQuantity(soa.icPulseMaxA, 'A') : '—' },
      { label: 'Vceo', value: formatQuantity(soa.vceoV, 'V') },
      { label: 'Rθjc of the thermal line', value: formatQuantity(soa.rthJcKPerW, 'K/W') },
    );
    const sb = soa.secondBreakdown;
    facts.push({
      label: 'Second breakdown',
      value: sb ? `${formatQuantity(sb.referenceIcA, 'A')} at ${formatQuantity(sb.referenceVceV, 'V')}, exponent ${sb.exponent}` : '—',
    });
    if (sb) facts.push({ label: 'Second-breakdown derating', value: deratingText(sb.derating) });
  } else if (soa.secondBreakdownDerating) {
    facts.push({ label: 'Second-breakdown derating', value: deratingText(soa.secondBreakdownDerating) });
  }
  if (soa.transistor === 'mosfet') facts.push({ label: 'Linear mode', value: linearModeText(soa) });
  return facts;
}

export type SoaViewProps = { soa: SoaJson };

/** The SOA model's values and its boundary chart at 25 °C and derated at 100 °C, with pulses. */
export function SoaView({ soa }: SoaViewProps) {
  const wide = useIsWide();
  const chart = useMemo(() => partSoaChart(soa), [soa]);
  const unrated = soa.transistor === 'mosfet' && !soa.linearMode?.dcRated;
  return (
    <View style={styles.view}>
      <FactGrid facts={soaFacts(soa)} />
      {unrated ? (
        <InlineAlert
          tone="info"
          message="The DC SOA of this MOSFET is not rated in linear mode, where hot spots can run away below the thermal line: a study warns whenever it works at DC."
        />
      ) : null}
      {chart.error !== null ? (
        <InlineAlert message={`The SOA chart cannot be drawn: ${chart.error}`} />
      ) : (
        <SoaChart
          boundaries={chart.boundaries}
          label={`Safe operating area, Ic against Vce: ${chart.boundaries.map((b) => b.label).join('; ')}`}
          height={wide ? 340 : 300}
        />
      )}
      {soa.kind === 'points' ? (
        <ValueTable
          label="Datasheet SOA curves"
          columns={['', 'Pulse', 'Points', 'Vce up to']}
          rows={soa.curves.map((c, i) => [String(i + 1), formatPulse(c.pulseS), String(c.points.length), formatQuantity(c.points[c.points.length - 1]?.vceV ?? 0, 'V')])}
        />
      ) : null}
      <Text variant="caption" tone="faint">
        Each segment is named by the limit that sets it. Derated lines follow Tj,max − Tc; a study checks every operating point at its own case temperature.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: spacing.md },
});
