import { memo } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import { at } from '../field-path';
import { useEditorActions, useFieldError } from '../editor-context';
import { moveItem, removeItem } from '../list-edits';
import type { FieldKind } from '../quantity-text';
import type { RawPoint } from '../types';
import { QuantityField } from './quantity-field';
import { RowActions } from './row-actions';

export type PointColumn = { key: string; label: string; kind: FieldKind };

export type PointListProps = {
  /** Form field of the array (`document.devices[0].package.terms`). */
  field: string;
  points: RawPoint[] | undefined;
  columns: readonly PointColumn[];
  /** One row, for labels and buttons: "term", "point". */
  noun: string;
  title?: string;
  /** Rows the list must keep (the format needs at least one Foster term). */
  minRows?: number;
  /** Whose rows these are, for screen readers: "Q1 dropout". */
  owner: string;
};

/** A small table of points or terms: one row of quantities each, rows added, moved and removed. */
export const PointList = memo(function PointList({ field, points = [], columns, noun, title, minRows = 0, owner }: PointListProps) {
  const { update } = useEditorActions();
  const listError = useFieldError(field);
  const blank = () => Object.fromEntries(columns.map((c) => [c.key, ''])) as RawPoint;
  return (
    <View style={styles.box}>
      {title ? (
        <Text variant="label" tone="muted">
          {title}
        </Text>
      ) : null}
      {points.map((point, i) => (
        <View key={i} style={styles.row}>
          <Text variant="mono" tone="faint" style={styles.index}>
            {i + 1}
          </Text>
          <View style={styles.cells}>
            {columns.map((c) => (
              <QuantityField
                key={c.key}
                field={at(at(field, i), c.key)}
                value={point[c.key]}
                kind={c.kind}
                label={c.label}
                fullLabel={`${owner} ${noun} ${i + 1} ${c.label}`}
                size="cell"
              />
            ))}
          </View>
          <RowActions
            noun={`${owner} ${noun} ${i + 1}`}
            index={i}
            count={points.length}
            keepOne={minRows > 0}
            onMove={(by) => update<RawPoint[]>(field, (list) => moveItem(list ?? [], i, by))}
            onDelete={() => update<RawPoint[] | undefined>(field, (list) => removeItem(list ?? [], i))}
          />
        </View>
      ))}
      {listError ? (
        <Text variant="caption" tone="danger" role="alert">
          {listError}
        </Text>
      ) : null}
      <Button
        label={`Add ${noun}`}
        variant="secondary"
        accessibilityLabel={`Add ${owner} ${noun}`}
        onPress={() => update<RawPoint[] | undefined>(field, (list) => [...(list ?? []), blank()])}
        style={styles.add}
      />
    </View>
  );
});

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: spacing.sm, paddingBottom: spacing.sm, borderBottomWidth: 1, borderBottomColor: color.border },
  index: { width: 18, paddingBottom: spacing.md },
  cells: { flexDirection: 'row', gap: spacing.sm, flexGrow: 1, flexShrink: 1, flexBasis: 220, maxWidth: 420 },
  add: { alignSelf: 'flex-start' },
});
