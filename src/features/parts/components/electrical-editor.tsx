import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

import type { DropoutRow, ElectricalValues, LimitRow } from '../part-form-values';
import { NumberField } from './number-field';
import { RowList } from './row-list';

const DROPOUT_COLUMNS = [
  { key: 'currentA', label: 'Current', unit: 'A' },
  { key: 'voltageV', label: 'Dropout', unit: 'V' },
] as const;
const LIMIT_COLUMNS = [
  { key: 'differentialV', label: 'Vin − Vout', unit: 'V' },
  { key: 'currentA', label: 'Limit', unit: 'A' },
] as const;

export type ElectricalEditorProps = { value: ElectricalValues; onChange: (value: ElectricalValues) => void; onRemove: () => void };

/** Iq, dropout and current-limit points, thermal shutdown: the part's electrical model for studies. */
export function ElectricalEditor({ value, onChange, onRemove }: ElectricalEditorProps) {
  return (
    <View style={styles.editor}>
      <View style={styles.row}>
        <NumberField label="Quiescent current Iq" unit="A" path="electrical.iqA" value={value.iqA} placeholder="0" hint="Input current that does not reach the load, e.g. 5 mA." onChange={(iqA) => onChange({ ...value, iqA })} />
      </View>
      <RowList<DropoutRow>
        title="Dropout against current (current rising)"
        item="dropout point"
        rows={value.dropout}
        columns={DROPOUT_COLUMNS}
        path="electrical.dropout.points"
        blank={{ currentA: '', voltageV: '' }}
        emptyText="No dropout points: 0 V."
        onChange={(dropout) => onChange({ ...value, dropout })}
      />
      <RowList<LimitRow>
        title="Current limit against Vin − Vout (foldback)"
        item="limit point"
        rows={value.currentLimit}
        columns={LIMIT_COLUMNS}
        path="electrical.currentLimit.points"
        blank={{ differentialV: '', currentA: '' }}
        emptyText="No current-limit points: no limit."
        onChange={(currentLimit) => onChange({ ...value, currentLimit })}
      />
      <View style={styles.block}>
        <Text variant="label" tone="muted">
          Thermal shutdown
        </Text>
        {value.shutdown ? (
          <View style={styles.row}>
            <NumberField label="Trips at" unit="°C" path="electrical.thermalShutdown.tripC" value={value.tripC} onChange={(tripC) => onChange({ ...value, tripC })} />
            <NumberField label="Resumes lower by" unit="K" path="electrical.thermalShutdown.hysteresisK" value={value.hysteresisK} onChange={(hysteresisK) => onChange({ ...value, hysteresisK })} />
            <Button label="No shutdown" variant="ghost" onPress={() => onChange({ ...value, shutdown: false })} />
          </View>
        ) : (
          <Button label="Add thermal shutdown" variant="ghost" style={styles.start} onPress={() => onChange({ ...value, shutdown: true })} />
        )}
      </View>
      <Button label="Remove the electrical model" variant="secondary" style={styles.start} onPress={onRemove} />
    </View>
  );
}

const styles = StyleSheet.create({
  editor: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.sm },
  block: { gap: spacing.xs },
  start: { alignSelf: 'flex-start' },
});
