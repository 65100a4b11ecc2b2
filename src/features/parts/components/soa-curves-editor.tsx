import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import type { SoaCurveRow, SoaPointRow } from '../part-form-values';
import { NumberField } from './number-field';
import { RowList } from './row-list';

const POINT_COLUMNS = [
  { key: 'vceV', label: 'Vce', unit: 'V' },
  { key: 'icA', label: 'Ic', unit: 'A' },
] as const;

export type SoaCurvesEditorProps = { curves: readonly SoaCurveRow[]; onChange: (curves: SoaCurveRow[]) => void };

/** Datasheet boundary curves at 25 °C, one per pulse width: Vce rising, Ic not rising. */
export function SoaCurvesEditor({ curves, onChange }: SoaCurvesEditorProps) {
  const update = (i: number, next: Partial<SoaCurveRow>) => onChange(curves.map((c, k) => (k === i ? { ...c, ...next } : c)));
  return (
    <View style={styles.list}>
      {curves.map((c, i) => (
        <View key={i} style={styles.curve} testID={`soa-curve-${i}`}>
          <View style={styles.head}>
            <NumberField
              label={`Curve ${i + 1}: pulse`}
              path={`soa.curves[${i}].pulseS`}
              value={c.pulse}
              hint="“dc”, or a pulse width such as 1 ms."
              size="normal"
              onChange={(pulse) => update(i, { pulse })}
            />
            <Button label={`Remove curve ${i + 1}`} variant="ghost" disabled={curves.length <= 1} onPress={() => onChange(curves.filter((_, k) => k !== i))} />
          </View>
          <RowList<SoaPointRow>
            title="Boundary points at a 25 °C case"
            item={`point of curve ${i + 1}`}
            rows={c.points}
            columns={POINT_COLUMNS}
            path={`soa.curves[${i}].points`}
            blank={{ vceV: '', icA: '' }}
            minRows={1}
            onChange={(points) => update(i, { points })}
          />
        </View>
      ))}
      <Button label="Add a curve" variant="ghost" style={styles.start} onPress={() => onChange([...curves, { pulse: '', points: [{ vceV: '', icA: '' }] }])} />
      <Text variant="caption" tone="faint">
        The last Vce of a curve is its voltage limit. Segments are named by slope: flat is the current limit, about −1 the thermal line, steeper second breakdown.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.md },
  curve: { gap: spacing.sm, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.border },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.sm },
  start: { alignSelf: 'flex-start' },
});
