import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import type { TapSegment } from '@/core/study';
import { color, radius, spacing } from '@/constants/theme';
import { formatDuration } from '@/features/studies/quantity-format';

import { segmentText, tapStrip } from '../rail-plan-rows';

/** Tap fills from light to dark, with ink that reads on each. */
const TAP_FILLS = ['#DCEBEE', '#6FA3AE', '#1E6270', '#123C45'] as const;
const TAP_INK = [color.ink, color.ink, color.onAccent, color.onAccent] as const;
const FIRST_SHOWN = 6;

export type TapStripProps = {
  segments: readonly TapSegment[];
  listedAll: boolean;
  changes: number;
  selectedS: number | null;
  onSelect: (timeS: number) => void;
};

/** The tap the selection picks, along the time axis of the first pass, and segment by segment. */
export function TapStrip({ segments, listedAll, changes, selectedS, onSelect }: TapStripProps) {
  const [all, setAll] = useState(false);
  const blocks = tapStrip(segments);
  if (segments.length === 0) return <Text tone="muted">No segment of the profile draws on the rail plan.</Text>;
  const endS = segments[segments.length - 1].timeS + segments[segments.length - 1].durationS;
  const shown = all ? segments : segments.slice(0, FIRST_SHOWN);
  return (
    <View style={styles.wrap}>
      <View style={styles.strip} role="img" aria-label={`Taps over the first pass: ${blocks.map((b) => `tap ${b.tap + 1} from ${formatDuration(b.fromS)}`).join(', ')}`}>
        {blocks.map((b) => (
          <View
            key={b.key}
            style={[styles.block, { left: `${b.start * 100}%`, width: `${b.width * 100}%`, backgroundColor: TAP_FILLS[b.tap % TAP_FILLS.length] }]}
          >
            {b.width > 0.06 ? (
              <Text variant="caption" numberOfLines={1} style={{ color: TAP_INK[b.tap % TAP_INK.length] }}>
                {b.width > 0.2 ? `Tap ${b.tap + 1}` : String(b.tap + 1)}
              </Text>
            ) : null}
          </View>
        ))}
      </View>
      <View style={styles.axis}>
        <Text variant="caption" tone="faint">
          {formatDuration(segments[0].timeS)}
        </Text>
        <Text variant="caption" tone="faint">
          {`${changes} tap ${changes === 1 ? 'change' : 'changes'} in the run`}
        </Text>
        <Text variant="caption" tone="faint">
          {formatDuration(endS)}
        </Text>
      </View>
      <View role="list" aria-label="Taps by segment" style={styles.list}>
        {shown.map((s) => (
          <Pressable
            key={s.index}
            role="button"
            aria-pressed={selectedS === s.timeS}
            accessibilityLabel={`Segment at ${formatDuration(s.timeS)} on tap ${s.tap + 1}: show on the chart`}
            onPress={() => onSelect(s.timeS)}
            style={({ pressed }) => [styles.item, selectedS === s.timeS && styles.selected, pressed && styles.pressed]}
          >
            <View style={[styles.swatch, { backgroundColor: TAP_FILLS[s.tap % TAP_FILLS.length] }]} />
            <View style={styles.body}>
              <Text variant="bodyStrong">{`${formatDuration(s.timeS)} · tap ${s.tap + 1}, ${s.tapName}`}</Text>
              <Text variant="caption" tone="muted">
                {`${s.label ? `${s.label}: ` : ''}${segmentText(s)}, for ${formatDuration(s.durationS)}`}
              </Text>
            </View>
          </Pressable>
        ))}
      </View>
      {segments.length > FIRST_SHOWN ? (
        <Button variant="ghost" label={all ? 'Show fewer segments' : `Show all ${segments.length} segments`} onPress={() => setAll((a) => !a)} style={styles.more} />
      ) : null}
      {listedAll ? null : (
        <Text variant="caption" tone="faint">
          Only the first segments of the pass are listed.
        </Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  strip: { height: 26, borderRadius: radius.sm, overflow: 'hidden', backgroundColor: color.surfaceMuted, borderWidth: 1, borderColor: color.border },
  block: { position: 'absolute', top: 0, bottom: 0, justifyContent: 'center', alignItems: 'center', borderRightWidth: 1, borderRightColor: color.surface },
  axis: { flexDirection: 'row', justifyContent: 'space-between', gap: spacing.sm },
  list: { gap: spacing.xxs, marginTop: spacing.xs },
  item: { flexDirection: 'row', gap: spacing.sm, paddingVertical: spacing.xs, paddingHorizontal: spacing.sm, borderRadius: radius.md, borderWidth: 1, borderColor: 'transparent' },
  selected: { borderColor: color.accent, backgroundColor: color.accentSoft },
  pressed: { backgroundColor: color.surfaceMuted },
  swatch: { width: 12, height: 12, borderRadius: 2, marginTop: 5, borderWidth: 1, borderColor: color.borderStrong },
  body: { flex: 1, gap: spacing.xxs },
  more: { alignSelf: 'flex-start' },
});
