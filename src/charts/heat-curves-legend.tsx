import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import type { CurveSeries, LimitLine } from './heat-curves-model';
import { LineSwatch } from './line-swatch';

export type HeatCurvesLegendProps = {
  curves: readonly CurveSeries[];
  limits: readonly LimitLine[];
  hidden: ReadonlySet<string>;
  showLimits: boolean;
  onToggle: (key: string) => void;
  onToggleLimits: () => void;
};

type ItemProps = { label: string; checked: boolean; onPress: () => void; children: ReactNode };

function LegendItem({ label, checked, onPress, children }: ItemProps) {
  return (
    <Pressable
      role="checkbox"
      aria-checked={checked}
      accessibilityState={{ checked }}
      accessibilityLabel={label}
      onPress={onPress}
      style={({ pressed }) => [styles.item, !checked && styles.off, pressed && styles.pressed]}
    >
      {children}
      <Text variant="caption" tone={checked ? 'default' : 'faint'} style={!checked && styles.struck}>
        {label}
      </Text>
    </Pressable>
  );
}

/** Series and limit lines; pressing one shows or hides it. */
export function HeatCurvesLegend({ curves, limits, hidden, showLimits, onToggle, onToggleLimits }: HeatCurvesLegendProps) {
  return (
    <View role="group" aria-label="Series shown" style={styles.legend}>
      {curves.map((curve) => (
        <LegendItem key={curve.key} label={curve.label} checked={!hidden.has(curve.key)} onPress={() => onToggle(curve.key)}>
          <LineSwatch style={curve.style} />
        </LegendItem>
      ))}
      {limits.length > 0 ? (
        <LegendItem label="Tj,max and target" checked={showLimits} onPress={onToggleLimits}>
          <View style={styles.limitSwatches}>
            {limits
              .filter((l, i, all) => all.findIndex((m) => m.kind === l.kind) === i)
              .map((l) => (
                <LineSwatch key={l.kind} style={l.style} width={14} />
              ))}
          </View>
        </LegendItem>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  item: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
    minHeight: 32,
    paddingHorizontal: spacing.sm,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: color.border,
    backgroundColor: color.surface,
  },
  off: { backgroundColor: color.surfaceMuted, borderStyle: 'dashed' },
  pressed: { borderColor: color.accent },
  struck: { textDecorationLine: 'line-through' },
  limitSwatches: { flexDirection: 'row', gap: 2 },
});
