import { StyleSheet, View } from 'react-native';

import { Chip, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';

/** A column of the log, or -1 for one value held in every row. */
export type ColumnPick = { column: number; unit: string; fixed: string };

export type ColumnChoiceProps = {
  label: string;
  columns: readonly string[];
  pick: ColumnPick;
  allowFixed?: boolean;
  unitLabel: string;
  onChange: (pick: ColumnPick) => void;
  error?: string | null;
};

/** Which column holds a quantity, in which unit bare numbers are; or a fixed value. */
export function ColumnChoice({ label, columns, pick, allowFixed, unitLabel, onChange, error }: ColumnChoiceProps) {
  return (
    <View style={styles.box}>
      <Text variant="label" tone="muted">
        {label}
      </Text>
      <View role="radiogroup" aria-label={label} style={styles.chips}>
        {columns.map((c, i) => (
          <Chip key={`${i}-${c}`} label={c} selected={pick.column === i} onPress={() => onChange({ ...pick, column: i })} />
        ))}
        {allowFixed ? <Chip label="Fixed value" selected={pick.column === -1} onPress={() => onChange({ ...pick, column: -1 })} /> : null}
      </View>
      <View style={styles.field}>
        {pick.column === -1 ? (
          <TextField label={`${label}, every row (${unitLabel})`} value={pick.fixed} onChangeText={(fixed) => onChange({ ...pick, fixed })} error={error ?? undefined} autoCapitalize="none" />
        ) : (
          <TextField label={`${label}: unit of bare numbers`} value={pick.unit} onChangeText={(unit) => onChange({ ...pick, unit })} error={error ?? undefined} autoCapitalize="none" />
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  field: { width: 240 },
});
