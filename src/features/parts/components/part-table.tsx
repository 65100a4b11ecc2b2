import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { DemoBadge } from '@/features/catalogues/components/demo-badge';
import { formatQuantity } from '@/features/studies/quantity-format';

import { KIND_LABEL, rthJcKPerW, thermalLabel } from '../part-format';
import type { Part } from '../types';
import { PartBadges } from './part-badges';

const COLUMNS = [
  { label: 'Name', flex: 3 },
  { label: 'Kind', flex: 1 },
  { label: 'Package', flex: 1.6 },
  { label: 'Tj,max', flex: 0.8 },
  { label: 'Rθjc', flex: 1.5 },
  { label: 'Models', flex: 1.6 },
] as const;

export type PartTableProps = { items: readonly Part[] };

export function PartTable({ items }: PartTableProps) {
  return (
    <View role="table" aria-label="Parts" style={styles.table}>
      <View role="row" style={[styles.row, styles.header]}>
        {COLUMNS.map((c) => (
          <View key={c.label} role="columnheader" style={[styles.cell, { flex: c.flex }]}>
            <Text variant="label" tone="muted">
              {c.label}
            </Text>
          </View>
        ))}
      </View>
      {items.map((p, i) => (
        <View key={p.id} role="row" testID={`part-row-${p.id}`} style={[styles.row, i < items.length - 1 && styles.divider]}>
          <View role="cell" style={[styles.cell, styles.stack, { flex: COLUMNS[0].flex }]}>
            <Link href={`/parts/${p.id}`}>
              <Text variant="bodyStrong" tone="accent">
                {p.name}
              </Text>
            </Link>
            {p.isDemo ? <DemoBadge /> : null}
          </View>
          <View role="cell" style={[styles.cell, { flex: COLUMNS[1].flex }]}>
            <Text>{KIND_LABEL[p.kind]}</Text>
          </View>
          <View role="cell" style={[styles.cell, { flex: COLUMNS[2].flex }]}>
            <Text tone={p.packageName ? 'default' : 'faint'}>{p.packageName || '—'}</Text>
          </View>
          <View role="cell" style={[styles.cell, { flex: COLUMNS[3].flex }]}>
            <Text>{formatQuantity(p.tjMaxC, '°C')}</Text>
          </View>
          <View role="cell" style={[styles.cell, styles.stack, { flex: COLUMNS[4].flex }]}>
            <Text>{formatQuantity(rthJcKPerW(p.thermal), 'K/W')}</Text>
            <Text variant="caption" tone="faint">
              {thermalLabel(p.thermal)}
            </Text>
          </View>
          <View role="cell" style={[styles.cell, { flex: COLUMNS[5].flex }]}>
            <PartBadges part={p} withDemo={false} />
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: color.border, borderRadius: radius.lg, backgroundColor: color.surface, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', paddingVertical: spacing.xs },
  header: { backgroundColor: color.surfaceMuted, borderBottomWidth: 1, borderBottomColor: color.border },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  cell: { paddingHorizontal: spacing.md, paddingVertical: spacing.xs },
  stack: { gap: spacing.xxs },
});
