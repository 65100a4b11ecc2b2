import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import type { CurveSeries } from './heat-curves-model';
import { LineSwatch } from './line-swatch';
import { valueAt } from './series-sample';
import { formatTemperature } from './temperature-axis';
import { formatTimeAt } from './time-axis';

export type HeatCurvesReadoutProps = {
  curves: readonly CurveSeries[];
  timeS: number | null;
  spanS: number;
  hint: string;
};

/** The values under the crosshair: its time and each shown series' temperature. */
export function HeatCurvesReadout({ curves, timeS, spanS, hint }: HeatCurvesReadoutProps) {
  if (timeS === null) {
    return (
      <View style={styles.box}>
        <Text variant="caption" tone="faint">
          {hint}
        </Text>
      </View>
    );
  }
  return (
    <View style={styles.box} aria-live="polite" testID="heat-curves-readout">
      <Text variant="label">{formatTimeAt(timeS, spanS)}</Text>
      {curves.map((curve) => {
        const value = valueAt(curve.series, timeS);
        return (
          <View key={curve.key} style={styles.value}>
            <LineSwatch style={curve.style} width={16} />
            <Text variant="caption" tone="muted">
              {curve.label}
            </Text>
            <Text variant="mono">{Number.isNaN(value) ? '—' : formatTemperature(value)}</Text>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    columnGap: spacing.md,
    rowGap: spacing.xxs,
    minHeight: 40,
    paddingVertical: spacing.xs,
    borderBottomWidth: 1,
    borderBottomColor: color.border,
  },
  value: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});
