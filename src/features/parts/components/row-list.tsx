import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import { usePartForm } from './form-context';
import { NumberField } from './number-field';

export type RowColumn<R> = { key: keyof R & string; label: string; unit?: string; hint?: string };

export type RowListProps<R extends Record<string, string>> = {
  title: string;
  /** One row's noun for labels: "term", "stage", "point". */
  item: string;
  rows: readonly R[];
  columns: readonly RowColumn<R>[];
  /** API path of the list (`thermal.terms`); row i's values sit at `${path}[i].${key}`. */
  path: string;
  onChange: (rows: R[]) => void;
  blank: R;
  emptyText?: string;
  /** At least this many rows stay (a Foster set needs one term). */
  minRows?: number;
};

/** Rows of numbers (terms, stages, curve points) with add and remove. */
export function RowList<R extends Record<string, string>>({ title, item, rows, columns, path, onChange, blank, emptyText, minRows = 0 }: RowListProps<R>) {
  const { errorAt } = usePartForm();
  const update = (i: number, key: keyof R, text: string) => onChange(rows.map((r, k) => (k === i ? { ...r, [key]: text } : r)));
  const listError = errorAt(path) && !rows.some((_, i) => columns.some((c) => errorAt(`${path}[${i}].${c.key}`))) ? errorAt(path) : undefined;
  return (
    <View style={styles.wrap}>
      <Text variant="label" tone="muted">
        {title}
      </Text>
      {rows.length === 0 && emptyText ? (
        <Text variant="caption" tone="faint">
          {emptyText}
        </Text>
      ) : null}
      {rows.map((r, i) => (
        <View key={i} style={styles.row} testID={`${path}[${i}]`}>
          <Text variant="mono" tone="faint" style={styles.index}>
            {i + 1}
          </Text>
          <View style={styles.fields}>
            {columns.map((c) => (
              <NumberField
                key={c.key}
                label={c.label}
                unit={c.unit}
                fullLabel={`${c.label} of ${item} ${i + 1}`}
                path={`${path}[${i}].${c.key}`}
                value={r[c.key]}
                hint={i === 0 ? c.hint : undefined}
                size="cell"
                onChange={(t) => update(i, c.key, t)}
              />
            ))}
          </View>
          <Button
            label="Remove"
            variant="ghost"
            accessibilityLabel={`Remove ${item} ${i + 1}`}
            disabled={rows.length <= minRows}
            onPress={() => onChange(rows.filter((_, k) => k !== i))}
          />
        </View>
      ))}
      {listError ? (
        <Text variant="caption" tone="danger" role="alert">
          {listError}
        </Text>
      ) : null}
      <Button label={`Add a ${item}`} variant="ghost" style={styles.add} onPress={() => onChange([...rows, { ...blank }])} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.sm, paddingTop: spacing.xs, borderTopWidth: 1, borderTopColor: color.border },
  index: { width: 18, paddingTop: 30 },
  fields: { flex: 1, flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  add: { alignSelf: 'flex-start' },
});
