import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';

import type { ForcedAirColumn } from '../types';
import { SelectField } from './select-field';

export type ForcedAirColumnsProps = {
  columns: readonly string[];
  value: readonly ForcedAirColumn[];
  onChange: (value: ForcedAirColumn[]) => void;
};

function SpeedField({ index, value, onChange }: { index: number; value: number; onChange: (speed: number) => void }) {
  // Kept as typed ("1." on the way to "1.5"); the mapping holds the number it reads as.
  const [text, setText] = useState(String(value));
  return (
    <TextField
      label="Air speed (m/s)"
      accessibilityLabel={`Air speed of forced-air column ${index + 1}, m/s`}
      value={text}
      inputMode="decimal"
      onChangeText={(t) => {
        setText(t);
        onChange(t.trim() === '' ? NaN : Number(t.replace(',', '.')));
      }}
    />
  );
}

/** Forced-air points of the import: a column and the air speed its values hold at. */
export function ForcedAirColumns({ columns, value, onChange }: ForcedAirColumnsProps) {
  const options = columns.map((c) => ({ value: c, label: c }));
  const update = (i: number, next: Partial<ForcedAirColumn>) => onChange(value.map((c, k) => (k === i ? { ...c, ...next } : c)));
  return (
    <View style={styles.list}>
      {value.map((c, i) => (
        <View key={i} style={styles.row}>
          <View style={styles.column}>
            <SelectField label={`Forced-air column ${i + 1}`} value={c.column} options={options} onChange={(column) => update(i, { column })} />
          </View>
          <View style={styles.speed}>
            <SpeedField index={i} value={c.airSpeedMPerS} onChange={(airSpeedMPerS) => update(i, { airSpeedMPerS })} />
          </View>
          <Button label="Remove" variant="ghost" onPress={() => onChange(value.filter((_, k) => k !== i))} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: spacing.sm },
  column: { flexGrow: 1, flexBasis: 180, maxWidth: 320 },
  speed: { width: 150 },
});
