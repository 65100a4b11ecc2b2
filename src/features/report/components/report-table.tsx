import { StyleSheet, View } from 'react-native';

import { Text, useIsWide } from '@/components/ui';
import { color, fontSize, lineHeight, spacing } from '@/constants/theme';

import { usePrinting } from '../use-printing';

export type ReportColumn<T> = {
  label: string;
  cell: (row: T) => string;
  /** Share of the width on a wide page (default 1). */
  flex?: number;
};

export type ReportTableProps<T> = {
  label: string;
  rows: readonly T[];
  rowKey: (row: T) => string;
  columns: readonly ReportColumn<T>[];
  /** Rows shown at most; the rest are counted below the table. */
  limit?: number;
  /** What a row is, for the count line: ["segment", "segments"]. */
  noun?: readonly [string, string];
};

/**
 * A plain table for reading and printing: rows and columns on a wide page; on a phone each
 * row becomes a short block of "label: value" lines (on paper, always columns). Long tables stop at `limit` rows and say
 * how many more there are.
 */
export function ReportTable<T>({ label, rows, rowKey, columns, limit, noun = ['row', 'rows'] }: ReportTableProps<T>) {
  // Paper is wide enough for the columns even when printed from a phone.
  const printing = usePrinting();
  const wide = useIsWide() || printing;
  const shown = limit !== undefined && rows.length > limit ? rows.slice(0, limit) : rows;
  const hidden = rows.length - shown.length;
  const [first, ...rest] = columns;
  return (
    <View style={styles.wrap}>
      {wide ? (
        <View role="table" aria-label={label} style={styles.table}>
          <View role="row" style={[styles.row, styles.header]}>
            {columns.map((column) => (
              <View key={column.label} role="columnheader" style={[styles.cell, { flex: column.flex ?? 1 }]}>
                <Text variant="label" tone="muted">
                  {column.label}
                </Text>
              </View>
            ))}
          </View>
          {shown.map((row, i) => (
            <View key={rowKey(row)} role="row" style={[styles.row, i < shown.length - 1 && styles.divider]}>
              {columns.map((column, k) => (
                <View key={column.label} role="cell" style={[styles.cell, { flex: column.flex ?? 1 }]}>
                  <Text variant={k === 0 ? 'label' : 'caption'} style={k === 0 ? undefined : styles.value}>
                    {column.cell(row)}
                  </Text>
                </View>
              ))}
            </View>
          ))}
        </View>
      ) : (
        <View role="list" aria-label={label} style={styles.blocks}>
          {shown.map((row) => (
            <View key={rowKey(row)} role="listitem" style={styles.block}>
              <Text variant="bodyStrong">{first.cell(row)}</Text>
              {rest.map((column) => (
                <Text key={column.label} variant="caption">
                  <Text variant="caption" tone="muted">
                    {column.label}:{' '}
                  </Text>
                  {column.cell(row)}
                </Text>
              ))}
            </View>
          ))}
        </View>
      )}
      {hidden > 0 ? (
        <Text variant="caption" tone="muted">
          {`Showing the first ${shown.length} of ${rows.length} ${noun[1]}; ${hidden} more ${hidden === 1 ? noun[0] : noun[1]} not listed.`}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  table: { borderWidth: 1, borderColor: color.border, backgroundColor: color.surface },
  row: { flexDirection: 'row', alignItems: 'flex-start' },
  header: { backgroundColor: color.surfaceMuted, borderBottomWidth: 1, borderBottomColor: color.border },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  cell: { paddingHorizontal: spacing.sm, paddingVertical: spacing.xs },
  value: { fontSize: fontSize.sm, lineHeight: lineHeight.sm },
  blocks: { gap: spacing.xs },
  block: { gap: 1, paddingVertical: spacing.xs, borderBottomWidth: 1, borderBottomColor: color.border },
});
