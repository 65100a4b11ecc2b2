import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { SoaChart } from '@/charts/soa-chart';
import { Button, Text, useIsWide } from '@/components/ui';
import type { DeviceSoaResult, SoaPointResult } from '@/core/study';
import { color, radius, spacing } from '@/constants/theme';
import { formatDuration, formatQuantity } from '@/features/studies/quantity-format';

import { chartBoundaries, chartPoints, groupSoaWarnings, LIMIT_WORDS, pulseText, shareOfAllowed, soaVerdictText, warningDevicesText, worstSentence } from '../soa-text';
import { TwoColumns } from './two-columns';
import { WarningBox } from './warning-box';

const FIRST_POINTS = 5;
const WARNING_TITLES: Record<string, string> = { 'mosfet-linear-mode': 'MOSFET in linear mode: the DC SOA may lie far below the thermal line' };

export type SoaPanelProps = {
  soa: Record<string, DeviceSoaResult>;
  selectedS: number | null;
  onSelectTime: (timeS: number) => void;
};

function PointRow({ point, selected, onPress }: { point: SoaPointResult; selected: boolean; onPress: () => void }) {
  const share = Math.round(shareOfAllowed(point));
  const outside = point.margin < 1;
  const times = point.occurrences > 1 ? ` · ${point.occurrences} times, first at ${formatDuration(point.firstTimeS)}` : '';
  return (
    <Pressable
      role="button"
      aria-pressed={selected}
      accessibilityLabel={`Point at ${formatDuration(point.timeS)}, ${share} % of the allowed current: show on the chart`}
      onPress={onPress}
      style={({ pressed }) => [styles.point, selected && styles.selected, pressed && styles.pressed]}
    >
      <Text variant="mono" tone="muted" style={styles.time}>
        {formatDuration(point.timeS)}
      </Text>
      <View style={styles.pointBody}>
        <Text variant="bodyStrong" tone={outside ? 'danger' : 'default'}>
          {`${formatQuantity(point.vceV, 'V')}, ${formatQuantity(point.icA, 'A')}: ${share}\u00a0% of the allowed ${formatQuantity(point.allowedA, 'A')}`}
        </Text>
        <Text variant="caption" tone="muted">
          {`${pulseText(point.pulseS)}, Tc ${formatQuantity(point.caseC, '°C')}, limited by ${LIMIT_WORDS[point.limit]}${times}`}
        </Text>
      </View>
    </Pressable>
  );
}

function DeviceSoa({ id, soa, selectedS, onSelectTime }: { id: string; soa: DeviceSoaResult } & Omit<SoaPanelProps, 'soa'>) {
  const wide = useIsWide();
  const [all, setAll] = useState(false);
  const boundaries = useMemo(() => chartBoundaries(soa), [soa]);
  const points = useMemo(() => chartPoints(soa), [soa]);
  const byMargin = useMemo(() => [...soa.points].sort((a, b) => a.margin - b.margin || a.timeS - b.timeS), [soa]);
  const shown = all ? byMargin : byMargin.slice(0, FIRST_POINTS);

  const chart = (
    <SoaChart
      boundaries={boundaries}
      points={points}
      label={`Safe operating area of ${id}: ${boundaries.map((b) => b.label).join(' and ')}, ${points.length} operating points`}
      onPickPoint={(pick) => {
        if (pick.index !== undefined) onSelectTime(soa.points[pick.index].timeS);
      }}
      height={wide ? 320 : 280}
    />
  );
  const words = (
    <View style={styles.words}>
      <Text variant="bodyStrong" testID={`soa-worst-${id}`}>
        {worstSentence(id, soa)}
      </Text>
      <Text tone={soa.passed ? 'default' : 'danger'}>{soaVerdictText(soa)}</Text>
      <Text variant="caption" tone="muted">
        {`${soa.stretches} ${soa.stretches === 1 ? 'stretch' : 'stretches'} with current, merged into ${soa.distinctPoints} distinct ${soa.distinctPoints === 1 ? 'point' : 'points'}${soa.pointsListedAll ? '' : `; the ${soa.points.length} with the lowest margins are listed`}. Press a point to move the heat-curves crosshair to its time.`}
      </Text>
      <View role="list" aria-label={`Operating points of ${id}, lowest margin first`} style={styles.points}>
        {shown.map((p, k) => (
          <PointRow key={`${p.timeS}-${p.vceV}-${p.icA}-${k}`} point={p} selected={selectedS === p.timeS} onPress={() => onSelectTime(p.timeS)} />
        ))}
      </View>
      {byMargin.length > FIRST_POINTS ? (
        <Button variant="ghost" label={all ? 'Show fewer points' : `Show all ${byMargin.length} points`} onPress={() => setAll((a) => !a)} style={styles.more} />
      ) : null}
    </View>
  );

  return (
    <View style={styles.device} testID={`soa-device-${id}`}>
      <View style={styles.deviceHead}>
        <Text variant="heading">{id}</Text>
        <View style={[styles.badge, soa.passed ? styles.badgePass : styles.badgeFail]}>
          <Text variant="caption" style={styles.badgeText}>
            {soa.passed ? 'SOA passes' : 'SOA fails'}
          </Text>
        </View>
        <Text variant="caption" tone="muted">
          {soa.transistor}
        </Text>
      </View>
      <TwoColumns firstShare={0.55}>{[chart, words]}</TwoColumns>
    </View>
  );
}

/**
 * The SOA check of every device that has an SOA model (PHYSICS.md §4): the derated and the
 * 25 °C boundaries with every operating point, the worst one in words, pass or fail, and the
 * warnings shared by several devices said once.
 */
export function SoaPanel({ soa, selectedS, onSelectTime }: SoaPanelProps) {
  const warnings = useMemo(() => groupSoaWarnings(soa), [soa]);
  const ids = Object.keys(soa);
  return (
    <View style={styles.panel} testID="soa-panel">
      {warnings.map((g) => (
        <WarningBox key={`${g.code}-${g.message}`} title={WARNING_TITLES[g.code] ?? 'SOA warning'} testID={`soa-warning-${g.code}`}>
          <Text>{g.message}</Text>
          <Text variant="caption">{`Concerns ${warningDevicesText(g)}.`}</Text>
        </WarningBox>
      ))}
      {ids.map((id) => (
        <DeviceSoa key={id} id={id} soa={soa[id]} selectedS={selectedS} onSelectTime={onSelectTime} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: spacing.lg },
  device: { gap: spacing.sm },
  deviceHead: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.sm },
  badge: { borderRadius: radius.pill, paddingHorizontal: spacing.sm, paddingVertical: 1 },
  badgePass: { backgroundColor: color.success },
  badgeFail: { backgroundColor: color.danger },
  badgeText: { color: color.onAccent },
  words: { gap: spacing.sm },
  points: { gap: spacing.xxs },
  point: { flexDirection: 'row', gap: spacing.sm, paddingVertical: spacing.xs, paddingHorizontal: spacing.sm, borderRadius: radius.md, borderWidth: 1, borderColor: 'transparent' },
  selected: { borderColor: color.accent, backgroundColor: color.accentSoft },
  pressed: { backgroundColor: color.surfaceMuted },
  time: { width: 64, paddingTop: 2 },
  pointBody: { flex: 1, gap: spacing.xxs },
  more: { alignSelf: 'flex-start' },
});
