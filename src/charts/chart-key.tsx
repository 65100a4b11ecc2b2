import { StyleSheet, View } from 'react-native';
import Svg, { Circle } from 'react-native-svg';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import type { LineStyle } from './heat-curves-model';
import { LineSwatch } from './line-swatch';

/** One entry of a chart's key: a line sample, or a marker as the plot draws it. */
export type ChartKeyItem = { key: string; label: string } & ({ line: LineStyle } | { marker: { stroke: string; fill: string } });

export type ChartKeyProps = { items: readonly ChartKeyItem[] };

/** What each line and marker of a chart stands for (not interactive). */
export function ChartKey({ items }: ChartKeyProps) {
  return (
    <View role="list" aria-label="Chart key" style={styles.key}>
      {items.map((item) => (
        <View key={item.key} role="listitem" style={styles.item}>
          {'line' in item ? (
            <LineSwatch style={item.line} />
          ) : (
            <Svg width={14} height={12} aria-hidden>
              <Circle cx={7} cy={6} r={4} stroke={item.marker.stroke} fill={item.marker.fill} strokeWidth={1.5} />
            </Svg>
          )}
          <Text variant="caption" tone="muted">
            {item.label}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  key: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xs },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});

export const markerColours = { stroke: color.ink, fill: color.surface } as const;
