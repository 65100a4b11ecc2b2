import { StyleSheet, View } from 'react-native';

import { Chip, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

import { conditionFields, type NaturalCondition } from '../plate-fin-estimate';
import { GeometryField } from './geometry-field';

export type NaturalConditionFieldsProps = {
  value: NaturalCondition;
  onChange: (next: NaturalCondition) => void;
  errors: Record<string, string>;
  /** Air speeds for forced-air estimates (plate-fin only). */
  withSpeeds?: boolean;
};

/** Where the still-air estimate is taken (a power shed or a rise reached, in an ambient) and the air speeds for forced air. */
export function NaturalConditionFields({ value, onChange, errors, withSpeeds }: NaturalConditionFieldsProps) {
  const fields = conditionFields(value.by);
  const set = (patch: Partial<NaturalCondition>) => onChange({ ...value, ...patch });
  return (
    <View style={styles.wrap}>
      <View style={styles.choice}>
        <Text variant="label" tone="muted">
          Still air, estimated at
        </Text>
        <View role="radiogroup" aria-label="Still air, estimated at" style={styles.chips}>
          <Chip label="A power" selected={value.by === 'power'} onPress={() => set({ by: 'power', levelText: value.by === 'power' ? value.levelText : '20' })} />
          <Chip label="A rise" selected={value.by === 'rise'} onPress={() => set({ by: 'rise', levelText: value.by === 'rise' ? value.levelText : '50' })} />
        </View>
      </View>
      <View style={styles.row}>
        <GeometryField spec={fields.level} value={value.levelText} onChange={(t) => set({ levelText: t })} error={errors.level} />
        <GeometryField spec={fields.ambient} value={value.ambientText} onChange={(t) => set({ ambientText: t })} error={errors.ambient} />
        {withSpeeds ? (
          <GeometryField
            spec={{ label: 'Air speeds', unit: 'm/s', read: 'speed' }}
            value={value.speedsText}
            onChange={(t) => set({ speedsText: t })}
            error={errors.speeds}
            hint="Separate with commas; empty for still air only."
          />
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  choice: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
