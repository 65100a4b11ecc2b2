import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import type { ImportRowError } from '../types';

export type RowErrorsProps = { errors: readonly ImportRowError[]; total?: number };

/** Every problem the server found, by row and column, so the file can be fixed in one pass. */
export function RowErrors({ errors, total }: RowErrorsProps) {
  return (
    <View style={styles.wrap}>
      <View role="table" aria-label="Problems in the file" style={styles.table}>
        <View role="row" style={[styles.row, styles.header]}>
          <Text variant="label" tone="muted" style={styles.rowNumber}>
            Row
          </Text>
          <Text variant="label" tone="muted" style={styles.column}>
            Column
          </Text>
          <Text variant="label" tone="muted" style={styles.reason}>
            Problem
          </Text>
        </View>
        {errors.map((e, i) => (
          <View key={`${e.row}-${e.column}-${i}`} role="row" testID={`row-error-${i}`} style={[styles.row, i < errors.length - 1 && styles.divider]}>
            <Text role="cell" variant="mono" style={styles.rowNumber}>
              {e.row}
            </Text>
            <Text role="cell" style={styles.column}>
              {e.column}
            </Text>
            <Text role="cell" tone="danger" style={styles.reason}>
              {e.message}
            </Text>
          </View>
        ))}
      </View>
      {total !== undefined && total > errors.length ? (
        <Text variant="caption" tone="muted">
          The first {errors.length} of {total} problems are listed.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  table: { borderWidth: 1, borderColor: color.border, borderRadius: radius.md, overflow: 'hidden', backgroundColor: color.surface },
  row: { flexDirection: 'row', gap: spacing.sm, paddingHorizontal: spacing.sm, paddingVertical: spacing.xs },
  header: { backgroundColor: color.surfaceMuted, borderBottomWidth: 1, borderBottomColor: color.border },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  rowNumber: { width: 40 },
  column: { width: 110 },
  reason: { flex: 1 },
});
