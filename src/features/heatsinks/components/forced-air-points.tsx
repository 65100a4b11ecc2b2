import { StyleSheet, View } from 'react-native';

import { Button, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';

import type { ForcedAirRow } from '../heatsink-form-values';

export type ForcedAirPointsProps = {
  points: readonly ForcedAirRow[];
  onChange: (points: ForcedAirRow[]) => void;
  errorAt: (path: string) => string | undefined;
  listError?: string;
};

/** Rθsa at given air speeds, from the sink's forced-air curve. */
export function ForcedAirPoints({ points, onChange, errorAt, listError }: ForcedAirPointsProps) {
  const update = (i: number, next: Partial<ForcedAirRow>) => onChange(points.map((p, k) => (k === i ? { ...p, ...next } : p)));
  return (
    <View style={styles.wrap}>
      <Text variant="label" tone="muted">
        Forced air
      </Text>
      {points.length === 0 ? (
        <Text variant="caption" tone="faint">
          No forced-air points: the sink is rated in still air only.
        </Text>
      ) : null}
      {points.map((p, i) => (
        <View key={i} style={styles.row}>
          <View style={styles.cell}>
            <TextField
              label="Air speed (m/s)"
              accessibilityLabel={`Air speed of point ${i + 1}, m/s`}
              value={p.airSpeedMPerS}
              inputMode="decimal"
              onChangeText={(t) => update(i, { airSpeedMPerS: t })}
              error={errorAt(`forcedAir[${i}].airSpeedMPerS`)}
            />
          </View>
          <View style={styles.cell}>
            <TextField
              label="Rθsa (K/W)"
              accessibilityLabel={`Rθsa of point ${i + 1}, K/W`}
              value={p.rthKPerW}
              inputMode="decimal"
              onChangeText={(t) => update(i, { rthKPerW: t })}
              error={errorAt(`forcedAir[${i}].rthKPerW`)}
            />
          </View>
          <Button label="Remove" variant="ghost" onPress={() => onChange(points.filter((_, k) => k !== i))} />
        </View>
      ))}
      {listError ? (
        <Text variant="caption" tone="danger" role="alert">
          {listError}
        </Text>
      ) : null}
      <Button label="Add a forced-air point" variant="ghost" style={styles.add} onPress={() => onChange([...points, { airSpeedMPerS: '', rthKPerW: '' }])} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.sm },
  cell: { flexGrow: 1, flexBasis: 120 },
  add: { alignSelf: 'flex-start' },
});
