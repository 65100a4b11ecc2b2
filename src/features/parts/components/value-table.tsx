import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

export type ValueTableProps = {
  /** Names the table for screen readers. */
  label: string;
  columns: readonly string[];
  rows: readonly (readonly string[])[];
  testID?: string;
};

/** A small read-only table of values: terms, stages, curve points. */
export function ValueTable({ label, columns, rows, testID }: ValueTableProps) {
  return (
    <View role="table" aria-label={label} testID={testID} style={styles.table}>
      <View role="row" style={[styles.row, styles.header]}>
        {columns.map((c, i) => (
          <Text key={`${c}-${i}`} role="columnheader" variant="label" tone="muted" style={[styles.cell, i === 0 && styles.first]}>
            {c}
          </Text>
        ))}
      </View>
      {rows.map((row, r) => (
        <View key={r} role="row" style={[styles.row, r < rows.length - 1 && styles.divider]}>
          {row.map((cell, i) => (
            <Text key={i} role="cell" variant={i === 0 ? 'caption' : 'body'} tone={i === 0 ? 'faint' : 'default'} style={[styles.cell, i === 0 && styles.first]}>
              {cell}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: color.border, borderRadius: radius.md, overflow: 'hidden', backgroundColor: color.surface },
  row: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: spacing.sm, paddingVertical: spacing.xs, gap: spacing.sm },
  header: { backgroundColor: color.surfaceMuted, borderBottomWidth: 1, borderBottomColor: color.border },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  cell: { flex: 1 },
  first: { flexGrow: 0, flexShrink: 0, flexBasis: 28 },
});
