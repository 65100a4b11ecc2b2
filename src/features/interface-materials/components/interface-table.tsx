import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { DemoBadge } from '@/features/catalogues/components/demo-badge';

import { formatBulk, formatInterfaceValue, KIND_LABELS } from '../interface-format';
import type { InterfaceMaterial } from '../types';

const COLUMNS = [
  { label: 'Name', flex: 3 },
  { label: 'Kind', flex: 1.1 },
  { label: 'Package', flex: 1 },
  { label: 'Resistance', flex: 1.5 },
  { label: 'Conductivity, thickness, contact', flex: 2.6 },
] as const;

export type InterfaceTableProps = { items: readonly InterfaceMaterial[] };

export function InterfaceTable({ items }: InterfaceTableProps) {
  return (
    <View role="table" aria-label="Interface materials" style={styles.table}>
      <View role="row" style={[styles.row, styles.header]}>
        {COLUMNS.map((c) => (
          <View key={c.label} role="columnheader" style={[styles.cell, { flex: c.flex }]}>
            <Text variant="label" tone="muted">
              {c.label}
            </Text>
          </View>
        ))}
      </View>
      {items.map((m, i) => {
        const cells = [KIND_LABELS[m.kind], m.packageName ?? '—', formatInterfaceValue(m), formatBulk(m)];
        return (
          <View key={m.id} role="row" style={[styles.row, i < items.length - 1 && styles.divider]}>
            <View role="cell" style={[styles.cell, styles.name, { flex: COLUMNS[0].flex }]}>
              <Link href={`/interface-materials/${m.id}`}>
                <Text variant="bodyStrong" tone="accent">
                  {m.name}
                </Text>
              </Link>
              {m.isDemo ? <DemoBadge /> : null}
            </View>
            {cells.map((text, k) => (
              <View key={COLUMNS[k + 1].label} role="cell" style={[styles.cell, { flex: COLUMNS[k + 1].flex }]}>
                <Text tone={text === '—' ? 'faint' : 'default'}>{text}</Text>
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
