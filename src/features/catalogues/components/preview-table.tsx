import { ScrollView, StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

export type PreviewTableProps = { columns: readonly string[]; rows: readonly string[][]; firstRow?: number };

const COLUMN_WIDTH = 132;

/** The file's first rows as read, with the row numbers a spreadsheet shows (header = 1). */
export function PreviewTable({ columns, rows, firstRow = 2 }: PreviewTableProps) {
  return (
    <ScrollView horizontal contentContainerStyle={styles.scroll}>
      <View role="table" aria-label="First rows of the file" style={styles.table}>
        <View role="row" style={[styles.row, styles.header]}>
          <View role="columnheader" style={[styles.cell, styles.number]}>
            <Text variant="label" tone="muted">
              Row
            </Text>
          </View>
          {columns.map((c, i) => (
            <View key={`${c}-${i}`} role="columnheader" style={[styles.cell, { width: COLUMN_WIDTH }]}>
              <Text variant="label" numberOfLines={2}>
                {c || '(no name)'}
              </Text>
            </View>
          ))}
        </View>
        {rows.map((row, r) => (
          <View key={r} role="row" style={[styles.row, r < rows.length - 1 && styles.divider]}>
            <View role="rowheader" style={[styles.cell, styles.number]}>
              <Text variant="mono" tone="faint">
                {firstRow + r}
              </Text>
            </View>
            {columns.map((c, i) => (
              <View key={`${c}-${i}`} role="cell" style={[styles.cell, { width: COLUMN_WIDTH }]}>
                <Text variant="caption" numberOfLines={2}>
                  {row[i] ?? ''}
                </Text>
              </View>
            ))}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1 },
  table: { borderWidth: 1, borderColor: color.border, borderRadius: radius.md, overflow: 'hidden', backgroundColor: color.surface },
  row: { flexDirection: 'row' },
  header: { backgroundColor: color.surfaceMuted, borderBottomWidth: 1, borderBottomColor: color.border },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  cell: { paddingHorizontal: spacing.sm, paddingVertical: spacing.xs },
  number: { width: 48 },
});
