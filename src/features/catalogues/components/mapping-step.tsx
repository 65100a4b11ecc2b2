import { StyleSheet, View } from 'react-native';

import { Button, Chip, Text, useIsWide } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import type { ImportField, ImportMapping } from '../types';
import { ForcedAirColumns } from './forced-air-columns';
import { SelectField } from './select-field';

export type MappingStepProps = {
  fields: readonly ImportField[];
  columns: readonly string[];
  mapping: ImportMapping;
  onChange: (mapping: ImportMapping) => void;
  /** Heatsinks: columns that hold Rθsa at an air speed. */
  withForcedAir?: boolean;
};

const NOT_IMPORTED = '';

const KIND_HINT: Record<ImportField['kind'], string> = {
  text: 'text',
  quantity: 'number with a unit',
  integer: 'whole number',
  number: 'number',
  choice: 'one of a list',
};

/** Per field: which column feeds it and, for a bare number, the unit it is in. */
export function MappingStep({ fields, columns, mapping, onChange, withForcedAir }: MappingStepProps) {
  const wide = useIsWide();
  const options = [{ value: NOT_IMPORTED, label: '— not imported —' }, ...columns.map((c) => ({ value: c, label: c }))];

  const setColumn = (field: ImportField, column: string) => {
    const fieldsNext = { ...mapping.fields };
    if (column === NOT_IMPORTED) delete fieldsNext[field.field];
    else fieldsNext[field.field] = { column, unit: mapping.fields[field.field]?.unit ?? (field.kind === 'quantity' ? field.defaultUnit : undefined) };
    onChange({ ...mapping, fields: fieldsNext });
  };
  const setUnit = (field: ImportField, unit: string) => {
    const current = mapping.fields[field.field];
    if (current) onChange({ ...mapping, fields: { ...mapping.fields, [field.field]: { ...current, unit } } });
  };

  return (
    <View style={styles.step}>
      {fields.map((field) => {
        const current = mapping.fields[field.field];
        return (
          <View key={field.field} testID={`map-${field.field}`} style={[styles.field, wide && styles.fieldWide]}>
            <View style={wide ? styles.nameWide : undefined}>
              <Text variant="bodyStrong">{field.label}</Text>
              <Text variant="caption" tone="faint">
                {KIND_HINT[field.kind]}
              </Text>
            </View>
            <View style={wide ? styles.columnWide : undefined}>
              <SelectField
                label={`Column for ${field.label}`}
                hideLabel
                value={current?.column ?? NOT_IMPORTED}
                options={options}
                onChange={(column) => setColumn(field, column)}
              />
            </View>
            {field.kind === 'quantity' && current && field.units ? (
              <View role="radiogroup" aria-label={`Unit of ${field.label}`} style={[styles.units, wide && styles.unitsWide]}>
                <Text variant="caption" tone="muted">
                  Bare numbers in
                </Text>
                {field.units.map((unit) => (
                  <Chip key={unit} label={unit} selected={(current.unit ?? field.defaultUnit) === unit} onPress={() => setUnit(field, unit)} />
                ))}
              </View>
            ) : null}
          </View>
        );
      })}
      {withForcedAir ? (
        <View style={styles.forced}>
          <Text variant="bodyStrong">Forced-air columns</Text>
          <Text variant="caption" tone="muted">
            Each column holds Rθsa (K/W) at one air speed; empty cells are skipped.
          </Text>
          <ForcedAirColumns columns={columns} value={mapping.forcedAir} onChange={(forcedAir) => onChange({ ...mapping, forcedAir })} />
          <Button
            label="Add a forced-air column"
            variant="ghost"
            style={styles.add}
            disabled={columns.length === 0}
            onPress={() => onChange({ ...mapping, forcedAir: [...mapping.forcedAir, { column: columns[0], airSpeedMPerS: 1 }] })}
          />
        </View>
      ) : null}
      <Text variant="caption" tone="faint">
        A cell may also carry its own unit (for example “1.2 °C/W” or “350 g”); the unit chosen here applies to bare numbers.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  step: { gap: spacing.sm },
  field: { gap: spacing.xs, paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: color.border },
  fieldWide: { flexDirection: 'row', alignItems: 'center', gap: spacing.lg },
  nameWide: { width: 180 },
  columnWide: { width: 260 },
  units: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.xs },
  unitsWide: { flex: 1 },
  forced: { gap: spacing.xs, paddingTop: spacing.sm },
  add: { alignSelf: 'flex-start' },
});
