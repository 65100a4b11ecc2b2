import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { DemoBadge } from '@/features/catalogues/components/demo-badge';

import { formatExponent, formatForcedAir, formatMass, formatPrice, formatRth, formatSize } from '../heatsink-format';
import type { Heatsink } from '../types';

const COLUMNS = [
  { label: 'Name', flex: 2.6 },
  { label: 'Rθsa, still air', flex: 1.6 },
  { label: 'Exponent n', flex: 1.1 },
  { label: 'Forced air, Rθsa', flex: 2.4 },
  { label: 'Mass', flex: 0.9 },
  { label: 'Size W × L × H', flex: 1.5 },
  { label: 'Devices', flex: 0.8 },
  { label: 'Price', flex: 0.8 },
] as const;

export type HeatsinkTableProps = { items: readonly Heatsink[] };

export function HeatsinkTable({ items }: HeatsinkTableProps) {
  return (
    <View role="table" aria-label="Heatsinks" style={styles.table}>
      <View role="row" style={[styles.row, styles.header]}>
        {COLUMNS.map((c) => (
          <View key={c.label} role="columnheader" style={[styles.cell, { flex: c.flex }]}>
            <Text variant="label" tone="muted">
              {c.label}
            </Text>
          </View>
        ))}
      </View>
      {items.map((h, i) => {
        const cells = [formatRth(h), formatExponent(h.convectionExponent), formatForcedAir(h.forcedAir), formatMass(h.massKg), formatSize(h), String(h.devicesPerSink), formatPrice(h.price)];
        return (
          <View key={h.id} role="row" testID={`heatsink-row-${h.id}`} style={[styles.row, i < items.length - 1 && styles.divider]}>
            <View role="cell" style={[styles.cell, styles.name, { flex: COLUMNS[0].flex }]}>
              <Link href={`/heatsinks/${h.id}`}>
                <Text variant="bodyStrong" tone="accent">
                  {h.name}
                </Text>
              </Link>
              {h.isDemo ? <DemoBadge /> : null}
            </View>
            {cells.map((text, k) => (
              <View key={COLUMNS[k + 1].label} role="cell" style={[styles.cell, { flex: COLUMNS[k + 1].flex }]}>
                <Text variant={k === 2 ? 'caption' : 'body'} tone={text === '—' ? 'faint' : 'default'}>
                  {text}
                </Text>
              </View>
            ))}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: color.border, borderRadius: radius.lg, backgroundColor: color.surface, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', paddingVertical: spacing.xs },
  header: { backgroundColor: color.surfaceMuted, borderBottomWidth: 1, borderBottomColor: color.border },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  cell: { paddingHorizontal: spacing.md, paddingVertical: spacing.xs },
  name: { gap: spacing.xxs },
});
