import { ScrollView, StyleSheet, View } from 'react-native';

import { Text, useIsWide } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

export type ResultCell = { text: string; note?: string; tone?: 'danger' | 'default' };
export type ResultColumn<T> = { label: string; cell: (row: T) => ResultCell };

export type ResultTableProps<T> = {
  label: string;
  rows: readonly T[];
  rowKey: (row: T) => string;
  /** The first column names the row. */
  columns: readonly ResultColumn<T>[];
};

function Cell({ cell, strong, width }: { cell: ResultCell; strong?: boolean; width?: number }) {
  return (
    <View role="cell" style={[styles.cell, width ? { width } : styles.flex]}>
      <Text variant={strong ? 'bodyStrong' : 'body'} tone={cell.tone === 'danger' ? 'danger' : 'default'}>
        {cell.text}
      </Text>
      {cell.note ? (
        <Text variant="caption" tone="faint">
          {cell.note}
        </Text>
      ) : null}
    </View>
  );
}

/**
 * Results in a table: one row per item on a wide window; on a phone the table turns on its
 * side (one row per quantity, one column per item) so a few items fit across 390 px.
 */
export function ResultTable<T>({ label, rows, rowKey, columns }: ResultTableProps<T>) {
  const wide = useIsWide();
  const [nameColumn, ...valueColumns] = columns;
  if (wide) {
    return (
      <View role="table" aria-label={label} style={styles.table}>
        <View role="row" style={[styles.row, styles.header]}>
          {columns.map((c) => (
            <View key={c.label} role="columnheader" style={[styles.cell, styles.flex]}>
              <Text variant="label" tone="muted">
                {c.label}
              </Text>
            </View>
          ))}
        </View>
        {rows.map((row, i) => (
          <View key={rowKey(row)} role="row" style={[styles.row, i < rows.length - 1 && styles.divider]}>
            {columns.map((c, k) => (
              <Cell key={c.label} cell={c.cell(row)} strong={k === 0} />
            ))}
          </View>
        ))}
      </View>
    );
  }
  const valueWidth = 104;
  return (
    <ScrollView horizontal contentContainerStyle={styles.scroll}>
      <View role="table" aria-label={label} style={styles.table}>
        <View role="row" style={[styles.row, styles.header]}>
          <View role="columnheader" style={[styles.cell, { width: 128 }]}>
            <Text variant="label" tone="muted">
              {nameColumn.label}
            </Text>
          </View>
          {rows.map((row) => (
            <View key={rowKey(row)} role="columnheader" style={[styles.cell, { width: valueWidth }]}>
              <Text variant="label">{nameColumn.cell(row).text}</Text>
            </View>
          ))}
        </View>
        {valueColumns.map((c, i) => (
          <View key={c.label} role="row" style={[styles.row, i < valueColumns.length - 1 && styles.divider]}>
            <View role="rowheader" style={[styles.cell, { width: 128 }]}>
              <Text variant="caption" tone="muted">
                {c.label}
              </Text>
            </View>
            {rows.map((row) => (
              <Cell key={rowKey(row)} cell={c.cell(row)} width={valueWidth} />
            ))}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1 },
  table: { flexGrow: 1, borderWidth: 1, borderColor: color.border, borderRadius: radius.md, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'flex-start' },
  header: { backgroundColor: color.surfaceMuted, borderBottomWidth: 1, borderBottomColor: color.border },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  cell: { paddingHorizontal: spacing.sm, paddingVertical: spacing.xs, gap: spacing.xxs },
  flex: { flex: 1 },
});
