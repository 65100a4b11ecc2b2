import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { chartColor, color, radius, spacing } from '@/constants/theme';
import type { Sensitivity } from '@/core/tolerance';

export type SensitivityBarsProps = { ranking: readonly Sensitivity[]; method: 'spearman' | 'main-effect' };

const valueText = (s: Sensitivity, method: SensitivityBarsProps['method']) =>
  method === 'spearman' ? `ρ ${s.value >= 0 ? '+' : '−'}${Math.abs(s.value).toFixed(2)}` : `${s.value >= 0 ? '+' : '−'}${Math.abs(s.value).toPrecision(3)} K`;

/** The inputs ranked by their pull on the peak, as bars scaled to the strongest (a tornado list). */
export function SensitivityBars({ ranking, method }: SensitivityBarsProps) {
  return (
    <View role="list" aria-label="Inputs by their pull on the peak" style={styles.list}>
      {ranking.map((s) => (
        <View key={s.key} role="listitem" aria-label={`${s.label}: ${valueText(s, method)}`} style={styles.row}>
          <Text style={styles.label} numberOfLines={2}>
            {s.label}
          </Text>
          <View style={styles.track}>
            <View style={[styles.bar, { width: `${Math.max(2, s.relative * 100)}%` }, s.value < 0 && styles.negative]} />
          </View>
          <Text variant="mono" style={styles.value}>
            {valueText(s, method)}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  label: { width: 136, flexShrink: 0 },
  track: { flex: 1, height: 14, backgroundColor: color.surfaceMuted, borderRadius: radius.sm, overflow: 'hidden' },
  bar: { height: 14, backgroundColor: chartColor.devices[0], borderRadius: radius.sm },
  negative: { backgroundColor: chartColor.devices[1] },
  value: { width: 82, textAlign: 'right', flexShrink: 0 },
});
