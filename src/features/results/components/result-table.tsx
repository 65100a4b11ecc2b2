import { ScrollView, StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

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

function Cell({ cell, strong, style }: { cell: ResultCell; strong?: boolean; style: StyleProp<ViewStyle> }) {
  return (
    <View role="cell" style={[styles.cell, style]}>
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
          {columns.map((c, k) => (
            <View key={c.label} role="columnheader" style={[styles.cell, k === 0 ? styles.nameFlex : styles.flex]}>
              <Text variant="label" tone="muted">
                {c.label}
              </Text>
            </View>
          ))}
        </View>
        {rows.map((row, i) => (
          <View key={rowKey(row)} role="row" style={[styles.row, i < rows.length - 1 && styles.divider]}>
            {columns.map((c, k) => (
              <Cell key={c.label} cell={c.cell(row)} strong={k === 0} style={k === 0 ? styles.nameFlex : styles.flex} />
            ))}
          </View>
        ))}
      </View>
    );
  }
  // Up to two items share the phone's width; more scroll sideways at a fixed width each.
  const scrolls = rows.length > 2;
  const valueStyle = scrolls ? styles.sideFixed : styles.sideValue;
  const table = (
    <View role="table" aria-label={label} style={styles.table}>
      <View role="row" style={[styles.row, styles.header]}>
        <View role="columnheader" style={[styles.cell, styles.sideName]}>
          <Text variant="label" tone="muted">
            {nameColumn.label}
          </Text>
        </View>
        {rows.map((row) => (
          <View key={rowKey(row)} role="columnheader" style={[styles.cell, valueStyle]}>
            <Text variant="label">{nameColumn.cell(row).text}</Text>
          </View>
        ))}
      </View>
      {valueColumns.map((c, i) => (
        <View key={c.label} role="row" style={[styles.row, i < valueColumns.length - 1 && styles.divider]}>
          <View role="rowheader" style={[styles.cell, styles.sideName]}>
            <Text variant="caption" tone="muted">
              {c.label}
            </Text>
          </View>
          {rows.map((row) => (
            <Cell key={rowKey(row)} cell={c.cell(row)} style={valueStyle} />
          ))}
        </View>
      ))}
    </View>
  );
  return scrolls ? (
    <ScrollView horizontal contentContainerStyle={styles.scroll}>
      {table}
    </ScrollView>
  ) : (
    table
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
  nameFlex: { flex: 1.5 },
  // On its side: a fixed name column, then value columns that share the width or scroll.
  sideName: { width: 104 },
  sideValue: { flex: 1 },
  sideFixed: { width: 104 },
});
