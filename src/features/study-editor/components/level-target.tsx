import { StyleSheet, View } from 'react-native';

import { Chip, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';

import type { LevelTarget } from '../profile-helpers';
import { valueOf } from '../helper-schemas';

export type LevelTargetProps = {
  target: string;
  vin: string;
  vout: string;
  deviceIds: string[];
  railPlan: boolean;
  errors: { vin?: string; vout?: string };
  onChange: (field: 'target' | 'vin' | 'vout', value: string) => void;
};

/** Chooses what the helper's levels set, and the held Vin and Vout for a current. */
export function LevelTargetFields({ target, vin, vout, deviceIds, railPlan, errors, onChange }: LevelTargetProps) {
  return (
    <View style={styles.box}>
      <Text variant="label" tone="muted">
        Levels are
      </Text>
      <View role="radiogroup" aria-label="Levels are" style={styles.chips}>
        <Chip label="Load current" selected={target === 'current'} onPress={() => onChange('target', 'current')} />
        {deviceIds.map((id) => (
          <Chip key={id} label={`Power of ${id}`} selected={target === `power:${id}`} onPress={() => onChange('target', `power:${id}`)} />
        ))}
      </View>
      {target === 'current' ? (
        <View style={styles.row}>
          {railPlan ? null : (
            <View style={styles.field}>
              <TextField label="Vin held (V)" value={vin} onChangeText={(t) => onChange('vin', t)} error={errors.vin} autoCapitalize="none" />
            </View>
          )}
          <View style={styles.field}>
            <TextField label="Vout held (V)" value={vout} onChangeText={(t) => onChange('vout', t)} error={errors.vout} autoCapitalize="none" />
          </View>
        </View>
      ) : null}
    </View>
  );
}

/** The target the form's values name (read after the schema has accepted them). */
export function levelTarget(values: { target: string; vin: string; vout: string }, railPlan: boolean): LevelTarget {
  if (values.target.startsWith('power:')) return { kind: 'power', device: values.target.slice('power:'.length) };
  return { kind: 'current', railPlan, voutV: valueOf(values.vout, 'voltage'), ...(railPlan ? {} : { vinV: valueOf(values.vin, 'voltage') }) };
}

export const levelKind = (target: string) => (target === 'current' ? ('current' as const) : ('power' as const));
export const levelUnit = (target: string) => (target === 'current' ? 'A' : 'W');

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  field: { width: 160 },
});
