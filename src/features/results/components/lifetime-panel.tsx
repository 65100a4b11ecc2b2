import { StyleSheet, View } from 'react-native';

import { CycleHistogramChart } from '@/charts/cycle-histogram-chart';
import { shareText } from '@/charts/cycle-histogram-model';
import { Text, useIsWide } from '@/components/ui';
import type { CycleClass, DeviceLifetime, LifetimeResult, SinkTouchResult, SiteResult, TouchResult } from '@/core/study';
import { spacing } from '@/constants/theme';
import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import { cycleClassText, cyclesText, deviceLifeSentence, lifeText, missionText, modelText, siteText, touchRuleText, touchSummary, touchVerdictText } from '../lifetime-text';
import { ResultTable, type ResultColumn } from './result-table';
import { TwoColumns } from './two-columns';
import { WarningBox } from './warning-box';

const CYCLE_COLUMNS: readonly ResultColumn<CycleClass>[] = [
  { label: 'Cycle', cell: (c) => ({ text: cycleClassText(c) }) },
  { label: 'Per repeat', cell: (c) => ({ text: formatNumber(c.count) }) },
  { label: 'Cycles to failure', cell: (c) => ({ text: cyclesText(c.cyclesToFailure) }) },
  { label: 'Share of damage', cell: (c) => ({ text: shareText(c.damageShare) }) },
];

const TOUCH_COLUMNS: readonly ResultColumn<SinkTouchResult>[] = [
  { label: 'Sink', cell: (s) => ({ text: s.sink }) },
  { label: 'Peak', cell: (s) => ({ text: formatQuantity(s.peakC, '°C'), tone: s.burnCaution ? 'danger' : 'default', note: s.burnCaution ? 'hot enough to burn' : undefined }) },
  { label: 'Limit', cell: (s) => ({ text: formatQuantity(s.limitC, '°C'), note: touchRuleText(s) }) },
  { label: 'Verdict', cell: (s) => ({ text: s.passed ? 'passes' : 'too hot', note: touchVerdictText(s), tone: s.passed ? 'default' : 'danger' }) },
];

function DeviceLife({ life, device }: { life: LifetimeResult; device: DeviceLifetime }) {
  const wide = useIsWide();
  const short = device.lifeYears !== null && device.lifeYears < 10;
  const arrhenius = device.arrhenius;
  const chart = (
    <View style={styles.block}>
      <CycleHistogramChart histogram={device.histogram} label={`Rainflow cycles of ${device.device} by junction swing`} height={wide ? 220 : 190} testID={`cycle-histogram-${device.device}`} />
      {device.histogram.counts.length === 0 ? <Text tone="muted">No cycles of 0.1 K or more.</Text> : null}
    </View>
  );
  const details = (
    <View style={styles.block}>
      {device.dominant.length > 0 ? (
        <ResultTable label={`Most damaging cycles of ${device.device}`} rows={device.dominant} rowKey={(c) => `${c.rangeK}:${c.meanC}`} columns={CYCLE_COLUMNS} />
      ) : null}
      {arrhenius ? (
        <Text variant="caption" tone="muted">
          {`Arrhenius factor against ${formatQuantity(arrhenius.referenceC, '°C')} (Ea ${formatQuantity(arrhenius.activationEnergyEV, 'eV')}), time-weighted: ${formatNumber(arrhenius.meanFactor)}, so a day ages the junction like ${formatQuantity(arrhenius.equivalentHoursPerDay, 'h')} at the reference.`}
        </Text>
      ) : null}
      {device.truncated ? (
        <Text variant="caption" tone="danger">
          The junction history was too long to count in full: only its start is counted.
        </Text>
      ) : null}
    </View>
  );
  return (
    <View style={styles.device} testID={`lifetime-${device.device}`}>
      <Text variant="bodyStrong" tone={short ? 'danger' : 'default'}>
        {deviceLifeSentence(device)}
      </Text>
      <Text variant="caption" tone="muted">
        {`Damage ${formatNumber(device.damagePerDay)} of the whole life per day at ${missionText(life)}.`}
      </Text>
      {device.startCycle ? (
        <Text variant="caption" tone="muted">
          {`Each cold start adds a ΔTj ${formatQuantity(device.startCycle.rangeK, 'K')} cycle about ${formatQuantity(device.startCycle.meanC, '°C')} (${cyclesText(device.startCycle.cyclesToFailure)} to failure): ${shareText(device.startCycle.damagePerDay / device.damagePerDay)} of the damage a day.`}
        </Text>
      ) : null}
      <TwoColumns firstShare={0.5}>{[chart, details]}</TwoColumns>
    </View>
  );
}

export type LifetimePanelProps = { lifetime?: LifetimeResult; touch?: TouchResult; site?: SiteResult };

/** Life from temperature cycles per device, touch-temperature verdict per sink, and the site assumed. */
export function LifetimePanel({ lifetime, touch, site }: LifetimePanelProps) {
  const tooHot = touch ? touchSummary(touch) : null;
  return (
    <View style={styles.panel}>
      {lifetime ? (
        <View style={styles.block}>
          {lifetime.shortest ? (
            <Text variant="heading">{`Shortest life: ${lifetime.shortest.device}, about ${lifeText(lifetime.shortest.lifeYears)}`}</Text>
          ) : (
            <Text variant="heading">No damaging temperature cycles</Text>
          )}
          {Object.values(lifetime.devices).map((d) => (
            <DeviceLife key={d.device} life={lifetime} device={d} />
          ))}
        </View>
      ) : null}
      {touch ? (
        <View style={styles.block}>
          <Text variant="bodyStrong">Touch temperature</Text>
          {tooHot ? (
            <WarningBox title="Too hot to touch" testID="touch-warning">
              <Text>{tooHot}</Text>
              <Text variant="caption">Guard or shield the sink, keep it out of reach, or cool it further; label hot surfaces as the applicable standard asks.</Text>
            </WarningBox>
          ) : null}
          <ResultTable label="Touch temperature by sink" rows={Object.values(touch.sinks)} rowKey={(s) => s.sink} columns={TOUCH_COLUMNS} />
        </View>
      ) : null}
      <View role="note" style={styles.block}>
        <Text variant="label" tone="muted">
          Assumptions
        </Text>
        {site ? <Text variant="caption" tone="muted">{siteText(site)}</Text> : null}
        {lifetime ? (
          <>
            <Text variant="caption" tone="muted">
              {`Counted: ${lifetime.counted === 'period' ? 'one period in its periodic steady state, closed as a repeating block' : 'the whole run from ambient, open ends as half cycles'}; ${missionText(lifetime)}.`}
            </Text>
            <Text variant="caption" tone="muted">
              {modelText(lifetime)}
            </Text>
            <Text variant="caption" tone="muted">
              The default law is the LESIT fit for wire-bonded power modules (Held et al., 1997), quoted from memory: for other packages the lives compare designs; they are not a rating. Use the part maker&apos;s power-cycling data where it exists.
            </Text>
          </>
        ) : null}
        {touch ? (
          <Text variant="caption" tone="muted">
            {`Touch limits by material and contact time follow IEC 62368-1 as recalled from memory; surfaces above about ${touch.burnCautionC} °C can burn (common practice). The applicable safety standard and local codes decide.`}
          </Text>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: spacing.md },
  block: { gap: spacing.sm },
  device: { gap: spacing.xs },
});
