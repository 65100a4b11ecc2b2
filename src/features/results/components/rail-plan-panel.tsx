import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { DissipationMap, type MapMarker } from '@/charts/dissipation-map';
import { Text, useIsWide } from '@/components/ui';
import type { RailPlanResult, SinkResult } from '@/core/study';
import { spacing } from '@/constants/theme';
import { formatQuantity } from '@/features/studies/quantity-format';

import { requiredRsaText, thresholdText, worstNote, worstRows, worstText, type WorstRow } from '../rail-plan-rows';
import { ResultTable, type ResultColumn } from './result-table';
import { TapStrip } from './tap-strip';
import { TwoColumns } from './two-columns';
import { WarningBox } from './warning-box';

const COLUMNS: readonly ResultColumn<WorstRow>[] = [
  { label: 'Tap', cell: (r) => ({ text: r.name, note: r.note }) },
  {
    label: 'Threshold given / best',
    cell: (r) => ({
      text: thresholdText(r.threshold),
      note: r.threshold && !r.threshold.safe ? 'above the best: the tap runs out of headroom first' : undefined,
      tone: r.threshold && !r.threshold.safe ? 'danger' : 'default',
    }),
  },
  { label: 'Worst, thresholds given', cell: (r) => ({ text: worstText(r.given), note: worstNote(r.given) }) },
  { label: 'Worst, best thresholds', cell: (r) => ({ text: worstText(r.best), note: worstNote(r.best) }) },
];

/** The plan's own warnings come prefixed with the field they concern. */
const stripPrefix = (w: string) => w.replace(/^railPlan: /, '');

export type RailPlanPanelProps = {
  plan: RailPlanResult;
  /** The sink the plan's device sits on, to set its rating beside the required one. */
  sink?: SinkResult;
  selectedS: number | null;
  onSelectTime: (timeS: number) => void;
};

/**
 * The rail plan (PHYSICS.md §2): the Vout × Iout dissipation map with its taps, the worst case
 * per tap with the given and the best thresholds, the Rθsa that needs, chatter, and the tap
 * the selection picks along the profile.
 */
export function RailPlanPanel({ plan, sink, selectedS, onSelectTime }: RailPlanPanelProps) {
  const wide = useIsWide();
  const rows = useMemo(() => worstRows(plan), [plan]);
  const markers = useMemo<MapMarker[]>(() => {
    const list: MapMarker[] = [];
    plan.worst.taps.forEach((w, k) => {
      if (!w) return;
      const overall = plan.worst.overall && plan.worst.overall.tap === k;
      list.push({ key: `w${k}`, voutV: w.voutV, ioutA: w.currentA, label: overall ? `worst, tap ${k + 1}` : `tap ${k + 1}`, strong: Boolean(overall) });
    });
    return list;
  }, [plan]);
  const required = requiredRsaText(plan);
  const chatter = plan.chatter?.chatters ? plan.chatter.message : undefined;
  const others = plan.warnings.map(stripPrefix).filter((w) => w !== chatter);
  const { map } = plan;

  const mapBlock = (
    <View style={styles.block}>
      <DissipationMap
        voutV={map.voutV}
        ioutA={map.ioutA}
        powerW={map.overall.powerW}
        status={map.overall.status}
        tap={map.overall.tap}
        tapNames={plan.taps.map((t) => t.name)}
        markers={markers}
        label={`Dissipation of ${plan.device} over output voltage and current, ${plan.taps.length} taps`}
        height={wide ? 340 : 280}
      />
      <Text variant="caption" tone="muted">
        {`Dissipation of ${plan.device} (all its parts together) at each output; where two taps may serve a cell (inside the hysteresis) the higher power is shown. Rings mark each tap’s worst case with the thresholds given.`}
      </Text>
    </View>
  );

  const facts = (
    <View style={styles.block}>
      {required ? <Text variant="bodyStrong">{required}</Text> : null}
      {sink && plan.requiredRsa ? (
        <Text variant="caption" tone="muted">
          {`${sink.id} is given as ${formatQuantity(sink.rthKPerW, 'K/W')}${sink.rthRangeKPerW ? ` (${formatQuantity(sink.rthRangeKPerW[0], 'K/W')} to ${formatQuantity(sink.rthRangeKPerW[1], 'K/W')} over the run)` : ''}; the heat curves show how the profile’s thermal mass changes the answer.`}
        </Text>
      ) : null}
      {chatter ? (
        <WarningBox title="Tap selection can chatter" testID="rail-chatter">
          <Text variant="caption">{chatter}</Text>
        </WarningBox>
      ) : null}
      {others.length > 0 ? (
        <WarningBox title={others.length === 1 ? 'Rail-plan warning' : `${others.length} rail-plan warnings`}>
          {others.map((w) => (
            <Text key={w} variant="caption">
              {`• ${w}`}
            </Text>
          ))}
        </WarningBox>
      ) : null}
    </View>
  );

  return (
    <View style={styles.panel} testID="rail-plan-panel">
      <Text tone="muted">
        {`${plan.taps.length} taps feed ${plan.device}; the comparator senses the ${plan.sensed === 'output' ? 'output' : 'set point'} with ${plan.thresholdsV.length === 1 ? 'threshold' : 'thresholds'} ${plan.thresholdsV.map((t) => formatQuantity(t, 'V')).join(', ')} and ${formatQuantity(plan.hysteresisV, 'V')} hysteresis.`}
      </Text>
      <TwoColumns firstShare={0.6}>{[mapBlock, facts]}</TwoColumns>
      <ResultTable label="Worst case per tap" rows={rows} rowKey={(r) => r.key} columns={COLUMNS} />
      <Text variant="label" tone="muted">
        Tap by segment
      </Text>
      <TapStrip
        segments={plan.selection.segments}
        listedAll={plan.selection.segmentsListedAll}
        changes={plan.selection.changes}
        selectedS={selectedS}
        onSelect={onSelectTime}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: spacing.md },
  block: { gap: spacing.sm },
});
